import { In, type DataSource, type EntityManager } from 'typeorm';
import type { Archive } from '../../../shared/schemas/job.schema';
import type { Page } from '../../../shared/schemas/list-query.schema';
import { allowedSpoolStatusTargets } from '../../../shared/schemas/spool-status.schema';
import type {
  ReworkDone,
  Spool,
  SpoolCreate,
  SpoolListQuery,
  SpoolStatusChange,
  SpoolUpdate,
} from '../../../shared/schemas/spool.schema';
import { AppError, forbidden, notFound, staleVersion, unprocessable } from '../../common/app-error';
import { applySortAndPage, likePattern } from '../../common/list-query';
import type { SessionActor } from '../../common/session-actor';
import type { AuditWriter } from '../audit/audit.service';
import type { JobService } from '../jobs/job.service';
import { SpoolRevisionEntity } from '../revisions/spool-revision.entity';
import { SpoolEntity, type SpoolRow } from './spool.entity';
import { toSpoolDto } from './spool.mapper';

const SORT_COLUMNS: Record<SpoolListQuery['sort'], string> = {
  mark: 's.mark',
  lineNumber: 's.lineNumber',
  status: 's.status',
  createdAt: 's.createdAt',
  updatedAt: 's.updatedAt',
};

/** Spools of the actor's shop. Every query filters by the actor's organisation. */
export class SpoolService {
  constructor(
    private readonly ds: DataSource,
    private readonly audit: AuditWriter,
    private readonly jobs: JobService,
  ) {}

  async list(actor: SessionActor, jobId: string, query: SpoolListQuery): Promise<Page<Spool>> {
    await this.jobs.find(this.ds.manager, actor, jobId);
    const qb = this.ds
      .getRepository(SpoolEntity)
      .createQueryBuilder('s')
      .where('s.organisationId = :org AND s.jobId = :jobId', { org: actor.organisationId, jobId });
    if (!query.includeArchived) qb.andWhere('s.archivedAt IS NULL');
    if (query.status) qb.andWhere('s.status = :status', { status: query.status });
    if (query.q) qb.andWhere('(s.mark ILIKE :q OR s.lineNumber ILIKE :q)', { q: likePattern(query.q) });
    const [rows, total] = await applySortAndPage(qb, 's', SORT_COLUMNS, query).getManyAndCount();
    return {
      items: await this.dtos(this.ds.manager, rows),
      total,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  async get(actor: SessionActor, id: string): Promise<Spool> {
    return this.dto(this.ds.manager, await this.find(this.ds.manager, actor, id));
  }

  async create(actor: SessionActor, jobId: string, input: SpoolCreate): Promise<Spool> {
    return this.ds.transaction(async (m) => {
      const job = await this.jobs.find(m, actor, jobId, true);
      if (job.status === 'archived') throw jobArchived();
      const row = await m.save(
        SpoolEntity,
        m.create(SpoolEntity, {
          organisationId: actor.organisationId,
          jobId: job.id,
          mark: input.mark,
          lineNumber: input.lineNumber,
          status: 'drafting',
        }),
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'spool.create',
        entityType: 'spool',
        entityId: row.id,
        details: { jobId: job.id, mark: row.mark },
      });
      return this.dto(m, await this.find(m, actor, row.id));
    });
  }

  async update(actor: SessionActor, id: string, input: SpoolUpdate): Promise<Spool> {
    return this.ds.transaction(async (m) => {
      const row = await this.find(m, actor, id, true);
      if (input.version !== row.version) throw staleVersion(await this.dto(m, row));
      assertNotArchived(row);
      await this.assertJobOpen(m, row);
      const changes: Partial<SpoolRow> = {};
      if (input.mark !== undefined && input.mark !== row.mark) changes.mark = input.mark;
      if (input.lineNumber !== undefined && input.lineNumber !== row.lineNumber)
        changes.lineNumber = input.lineNumber;
      if (Object.keys(changes).length === 0) return this.dto(m, row);
      await this.write(m, actor, row, changes, 'spool.update', {
        changes,
        before: { mark: row.mark, lineNumber: row.lineNumber },
      });
      return this.dto(m, await this.find(m, actor, row.id));
    });
  }

  /** Moves the spool along the shop floor; each role may make only its own moves. */
  async changeStatus(actor: SessionActor, id: string, input: SpoolStatusChange): Promise<Spool> {
    return this.ds.transaction(async (m) => {
      const row = await this.find(m, actor, id, true);
      if (input.version !== row.version) throw staleVersion(await this.dto(m, row));
      assertNotArchived(row);
      await this.assertJobOpen(m, row);
      if (input.status === row.status) return this.dto(m, row);
      const allowed = allowedSpoolStatusTargets(actor.role, row.status);
      if (!allowed.includes(input.status)) {
        throw forbidden(`A ${actor.role} cannot move a spool from ${row.status} to ${input.status}`, {
          from: row.status,
          to: input.status,
          allowed,
        });
      }
      await this.write(m, actor, row, { status: input.status }, 'spool.status', {
        from: row.status,
        to: input.status,
      });
      return this.dto(m, await this.find(m, actor, row.id));
    });
  }

  /**
   * Clears the rework flag once the bay has reworked the spool to its current revision.
   * Stale version: 409; no flag: 422 (nothing to clear).
   */
  async reworkDone(actor: SessionActor, id: string, input: ReworkDone): Promise<Spool> {
    return this.ds.transaction(async (m) => {
      const row = await this.find(m, actor, id, true);
      if (input.version !== row.version) throw staleVersion(await this.dto(m, row));
      assertNotArchived(row);
      if (!row.rework) throw unprocessable(`Spool ${row.mark} is not flagged for rework`);
      await this.write(m, actor, row, { rework: null }, 'spool.rework-done', {
        letter: row.rework.letter,
        status: row.status,
      });
      return this.dto(m, await this.find(m, actor, row.id));
    });
  }

  /** Archives the spool (idempotent): it leaves the job's list and its spool count. */
  async archive(actor: SessionActor, id: string, input: Archive): Promise<Spool> {
    return this.ds.transaction(async (m) => {
      const row = await this.find(m, actor, id, true);
      if (input.version !== undefined && input.version !== row.version)
        throw staleVersion(await this.dto(m, row));
      if (row.archivedAt) return this.dto(m, row);
      await this.assertJobOpen(m, row);
      await this.write(m, actor, row, { archivedAt: new Date() }, 'spool.archive', { mark: row.mark });
      return this.dto(m, await this.find(m, actor, row.id));
    });
  }

  /**
   * 409 `job_archived` when the spool's job is archived: an archived job is read-only
   * throughout. The job row is share-locked, so archiving waits for this write (and a
   * write that started after the archive sees it).
   */
  async assertJobOpen(m: EntityManager, row: SpoolRow): Promise<void> {
    const rows: Array<{ status: string }> = await m.query(
      `SELECT status FROM job WHERE id = $1 AND organisation_id = $2 FOR SHARE`,
      [row.jobId, row.organisationId],
    );
    if (rows[0]?.status === 'archived') throw jobArchived();
  }

  /** The spool row in the actor's shop, optionally locked for update; 404 otherwise. */
  async find(m: EntityManager, actor: SessionActor, id: string, lock = false): Promise<SpoolRow> {
    const qb = m
      .getRepository(SpoolEntity)
      .createQueryBuilder('s')
      .where('s.id = :id AND s.organisationId = :org', { id, org: actor.organisationId });
    if (lock) qb.setLock('pessimistic_write');
    const row = await qb.getOne();
    if (!row) throw notFound('Spool');
    return row;
  }

  /** The API shape of one spool, read with `m` (inside a transaction, sees its writes). */
  async dto(m: EntityManager, row: SpoolRow): Promise<Spool> {
    const [dto] = await this.dtos(m, [row]);
    return dto!;
  }

  private async write(
    m: EntityManager,
    actor: SessionActor,
    row: SpoolRow,
    changes: Partial<SpoolRow>,
    action: string,
    details: Record<string, unknown>,
  ): Promise<void> {
    await m.update(
      SpoolEntity,
      { id: row.id, organisationId: actor.organisationId },
      { ...changes, version: row.version + 1, updatedAt: new Date() },
    );
    await this.audit(m, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action,
      entityType: 'spool',
      entityId: row.id,
      details,
    });
  }

  private async dtos(m: EntityManager, rows: SpoolRow[]): Promise<Spool[]> {
    if (rows.length === 0) return [];
    const revisions = await m.getRepository(SpoolRevisionEntity).find({
      select: {
        id: true,
        spoolId: true,
        letter: true,
        state: true,
        issuedAt: true,
        updatedAt: true,
        version: true,
      },
      where: [
        { spoolId: In(rows.map((r) => r.id)), state: 'draft' },
        { spoolId: In(rows.map((r) => r.id)), state: 'issued' },
      ],
    });
    return rows.map((row) => {
      const mine = revisions.filter((r) => r.spoolId === row.id);
      const current = mine.find((r) => r.id === row.currentRevisionId) ?? null;
      const draft = mine.find((r) => r.state === 'draft') ?? null;
      return toSpoolDto(row, current, draft);
    });
  }
}

/** 409 for a write under an archived job. */
export function jobArchived(): AppError {
  return new AppError(
    409,
    'job_archived',
    'This job is archived, so its spools and drafts are read-only. Nothing was saved.',
  );
}

/** 422 for a write to an archived spool. */
export function assertNotArchived(row: SpoolRow): void {
  if (row.archivedAt) throw unprocessable('This spool is archived and can no longer be changed');
}
