import type { DataSource, EntityManager } from 'typeorm';
import type { Archive, Job, JobCreate, JobListQuery, JobUpdate } from '../../../shared/schemas/job.schema';
import type { Page } from '../../../shared/schemas/list-query.schema';
import { notFound, staleVersion, unprocessable } from '../../common/app-error';
import { applySortAndPage, likePattern } from '../../common/list-query';
import { sameJson } from '../../common/same-json';
import type { SessionActor } from '../../common/session-actor';
import type { AuditWriter } from '../audit/audit.service';
import { SpoolEntity } from '../spools/spool.entity';
import { JobEntity, type JobRow } from './job.entity';
import { toJobDto } from './job.mapper';

const SORT_COLUMNS: Record<JobListQuery['sort'], string> = {
  number: 'j.number',
  title: 'j.title',
  client: 'j.client',
  status: 'j.status',
  createdAt: 'j.createdAt',
  updatedAt: 'j.updatedAt',
};

/** Jobs of the actor's shop. Every query filters by the actor's organisation. */
export class JobService {
  constructor(
    private readonly ds: DataSource,
    private readonly audit: AuditWriter,
  ) {}

  async list(actor: SessionActor, query: JobListQuery): Promise<Page<Job>> {
    const qb = this.ds
      .getRepository(JobEntity)
      .createQueryBuilder('j')
      .where('j.organisationId = :org', { org: actor.organisationId });
    if (query.status) qb.andWhere('j.status = :status', { status: query.status });
    else if (!query.includeArchived) qb.andWhere(`j.status <> 'archived'`);
    if (query.q) {
      qb.andWhere('(j.number ILIKE :q OR j.title ILIKE :q OR j.client ILIKE :q OR j.site ILIKE :q)', {
        q: likePattern(query.q),
      });
    }
    const [rows, total] = await applySortAndPage(qb, 'j', SORT_COLUMNS, query).getManyAndCount();
    const counts = await this.spoolCounts(
      this.ds.manager,
      rows.map((r) => r.id),
    );
    return {
      items: rows.map((r) => toJobDto(r, counts.get(r.id) ?? 0)),
      total,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  async get(actor: SessionActor, id: string): Promise<Job> {
    return this.dto(this.ds.manager, await this.find(this.ds.manager, actor, id));
  }

  async create(actor: SessionActor, input: JobCreate): Promise<Job> {
    return this.ds.transaction(async (m) => {
      const row = await m.save(
        JobEntity,
        m.create(JobEntity, { ...input, organisationId: actor.organisationId }),
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'job.create',
        entityType: 'job',
        entityId: row.id,
        details: { number: row.number },
      });
      return this.dto(m, await this.find(m, actor, row.id));
    });
  }

  async update(actor: SessionActor, id: string, input: JobUpdate): Promise<Job> {
    return this.ds.transaction(async (m) => {
      const row = await this.find(m, actor, id, true);
      if (input.version !== row.version) throw staleVersion(await this.dto(m, row));
      if (row.status === 'archived') throw unprocessable('This job is archived and can no longer be edited');
      const { version: _version, ...fields } = input;
      const changed = Object.fromEntries(
        Object.entries(fields).filter(([k, v]) => v !== undefined && !sameJson(v, row[k as keyof JobRow])),
      ) as Partial<JobRow>;
      if (Object.keys(changed).length === 0) return this.dto(m, row);
      await m.update(
        JobEntity,
        { id: row.id, organisationId: actor.organisationId },
        { ...changed, version: row.version + 1, updatedAt: new Date() },
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'job.update',
        entityType: 'job',
        entityId: row.id,
        details: { fields: Object.keys(changed), before: pick(row, Object.keys(changed)) },
      });
      return this.dto(m, await this.find(m, actor, row.id));
    });
  }

  /** Archives the job (idempotent). Its spools stay readable; nothing is deleted. */
  async archive(actor: SessionActor, id: string, input: Archive): Promise<Job> {
    return this.ds.transaction(async (m) => {
      const row = await this.find(m, actor, id, true);
      if (input.version !== undefined && input.version !== row.version)
        throw staleVersion(await this.dto(m, row));
      if (row.status === 'archived') return this.dto(m, row);
      await m.update(
        JobEntity,
        { id: row.id, organisationId: actor.organisationId },
        { status: 'archived', archivedAt: new Date(), version: row.version + 1, updatedAt: new Date() },
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'job.archive',
        entityType: 'job',
        entityId: row.id,
        details: { previousStatus: row.status },
      });
      return this.dto(m, await this.find(m, actor, row.id));
    });
  }

  /** The job row in the actor's shop, optionally locked for update; 404 otherwise. */
  async find(m: EntityManager, actor: SessionActor, id: string, lock = false): Promise<JobRow> {
    const qb = m
      .getRepository(JobEntity)
      .createQueryBuilder('j')
      .where('j.id = :id AND j.organisationId = :org', { id, org: actor.organisationId });
    if (lock) qb.setLock('pessimistic_write');
    const row = await qb.getOne();
    if (!row) throw notFound('Job');
    return row;
  }

  private async dto(m: EntityManager, row: JobRow): Promise<Job> {
    const counts = await this.spoolCounts(m, [row.id]);
    return toJobDto(row, counts.get(row.id) ?? 0);
  }

  private async spoolCounts(m: EntityManager, jobIds: string[]): Promise<Map<string, number>> {
    if (jobIds.length === 0) return new Map();
    const raw = await m
      .getRepository(SpoolEntity)
      .createQueryBuilder('s')
      .select('s.jobId', 'jobId')
      .addSelect('count(*)::int', 'count')
      .where('s.jobId IN (:...ids)', { ids: jobIds })
      .andWhere('s.archivedAt IS NULL')
      .groupBy('s.jobId')
      .getRawMany<{ jobId: string; count: number }>();
    return new Map(raw.map((r) => [r.jobId, r.count]));
  }
}

function pick(row: JobRow, keys: string[]): Record<string, unknown> {
  return Object.fromEntries(keys.map((k) => [k, row[k as keyof JobRow]]));
}
