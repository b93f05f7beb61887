import type { DataSource, EntityManager } from 'typeorm';
import type { QueryDeepPartialEntity } from 'typeorm';
import type {
  DraftIssue,
  DraftSave,
  ReworkConfirmation,
  Revision,
  RevisionSummary,
} from '../../../shared/schemas/revision.schema';
import { AppError, notFound, staleVersion } from '../../common/app-error';
import type { SessionActor } from '../../common/session-actor';
import type { AuditWriter } from '../audit/audit.service';
import type { SpoolRework } from '../../../shared/schemas/spool.schema';
import { JobEntity } from '../jobs/job.entity';
import { SpoolEntity, type SpoolRow } from '../spools/spool.entity';
import { assertNotArchived, type SpoolService } from '../spools/spool.service';
import { UserEntity } from '../users/user.entity';
import { assertValidDesign } from './design-validation';
import { toRevisionDto, toRevisionSummary, type RevisionWithAuthor } from './revision.mapper';
import { nextRevisionLetter } from './revision-letter';
import { reworkNeed } from './rework-check';
import { SpoolRevisionEntity, type SpoolRevisionRow } from './spool-revision.entity';
import { starterDesign } from './starter-design';

/** Revisions of a spool: the one working draft, and the issued ones that never change. */
export class RevisionService {
  constructor(
    private readonly ds: DataSource,
    private readonly audit: AuditWriter,
    private readonly spools: SpoolService,
  ) {}

  /** Newest first, without designs. */
  async list(actor: SessionActor, spoolId: string): Promise<RevisionSummary[]> {
    const spool = await this.spools.find(this.ds.manager, actor, spoolId);
    const rows = await this.query(this.ds.manager, actor)
      .andWhere('r.spoolId = :spoolId', { spoolId: spool.id })
      // Letters order the revisions (Z < AA): by length, then alphabetically.
      .orderBy('length(r.letter)', 'DESC')
      .addOrderBy('r.letter', 'DESC')
      .getRawAndEntities();
    return withAuthors(rows).map(toRevisionSummary);
  }

  async get(actor: SessionActor, spoolId: string, revisionId: string): Promise<Revision> {
    const row = await this.findOne(this.ds.manager, actor, { spoolId, id: revisionId });
    if (!row) throw notFound('Revision');
    return toRevisionDto(row);
  }

  /**
   * The spool's working draft, created when missing from a copy of the current issued
   * design (or a starter design). `created` says which happened.
   */
  async openDraft(actor: SessionActor, spoolId: string): Promise<{ created: boolean; draft: Revision }> {
    return this.ds.transaction(async (m) => {
      // Locking the spool serialises two people opening a draft at the same moment.
      const spool = await this.spools.find(m, actor, spoolId, true);
      const existing = await this.findOne(m, actor, { spoolId: spool.id, state: 'draft' });
      if (existing) return { created: false, draft: toRevisionDto(existing) };
      assertNotArchived(spool);
      await this.spools.assertJobOpen(m, spool);
      const letters = await m.getRepository(SpoolRevisionEntity).find({
        select: { letter: true },
        where: { spoolId: spool.id, organisationId: actor.organisationId },
      });
      const current = spool.currentRevisionId
        ? await m.getRepository(SpoolRevisionEntity).findOneBy({
            id: spool.currentRevisionId,
            organisationId: actor.organisationId,
          })
        : null;
      const row = await m.save(
        SpoolRevisionEntity,
        m.create(SpoolRevisionEntity, {
          organisationId: actor.organisationId,
          spoolId: spool.id,
          letter: nextRevisionLetter(letters.map((l) => l.letter)),
          state: 'draft',
          design: current ? current.design : starterDesign(spool),
          note: '',
          authorId: actor.id,
        }),
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'revision.open-draft',
        entityType: 'spool_revision',
        entityId: row.id,
        details: { spoolId: spool.id, letter: row.letter, copiedFrom: current?.letter ?? null },
      });
      return { created: true, draft: toRevisionDto((await this.findOne(m, actor, { id: row.id }))!) };
    });
  }

  /** Replaces the draft's design (and note). Stale version: 409 with the stored draft, nothing written. */
  async saveDraft(actor: SessionActor, spoolId: string, input: DraftSave): Promise<Revision> {
    assertValidDesign(input.design);
    return this.ds.transaction(async (m) => {
      const spool = await this.spools.find(m, actor, spoolId);
      const draft = await this.lockDraft(m, actor, spool.id);
      if (input.version !== draft.version) throw staleVersion(toRevisionDto(draft));
      assertNotArchived(spool);
      await this.spools.assertJobOpen(m, spool);
      await m.update(
        SpoolRevisionEntity,
        { id: draft.id, organisationId: actor.organisationId, state: 'draft' },
        {
          // jsonb column: TypeORM's deep-partial type cannot express an open record.
          design: input.design as QueryDeepPartialEntity<Record<string, unknown>>,
          ...(input.note !== undefined ? { note: input.note } : {}),
          // The last person to save a draft is its author.
          authorId: actor.id,
          version: draft.version + 1,
          updatedAt: new Date(),
        },
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'revision.save-draft',
        entityType: 'spool_revision',
        entityId: draft.id,
        details: { spoolId: spool.id, letter: draft.letter, version: draft.version + 1 },
      });
      return toRevisionDto((await this.findOne(m, actor, { id: draft.id }))!);
    });
  }

  /**
   * Issues the draft in one transaction: the previous issued revision becomes superseded,
   * the draft becomes issued, the spool points at it (and leaves `drafting`), and the
   * audit event is written. Any failure rolls all of it back.
   */
  async issueDraft(actor: SessionActor, spoolId: string, input: DraftIssue): Promise<Revision> {
    return this.ds.transaction(async (m) => {
      // The spool lock queues concurrent issues; whoever comes after the first finds the
      // draft gone and gets 409 with the revision that was issued, not a 404.
      const spool = await this.spools.find(m, actor, spoolId, true);
      const open = await this.findOne(m, actor, { spoolId: spool.id, state: 'draft' });
      if (!open && spool.currentRevisionId) {
        const issued = await this.findOne(m, actor, { id: spool.currentRevisionId });
        throw new AppError(409, 'already_issued', 'This spool has no open draft: it was already issued.', {
          current: issued ? toRevisionDto(issued) : null,
        });
      }
      const draft = await this.lockDraft(m, actor, spool.id);
      if (input.version !== undefined && input.version !== draft.version)
        throw staleVersion(toRevisionDto(draft));
      assertNotArchived(spool);
      await this.spools.assertJobOpen(m, spool);
      assertValidDesign(draft.design);
      const rework = await this.reworkOnIssue(m, actor, spool, draft, input);
      const now = new Date();
      const superseded = await m.update(
        SpoolRevisionEntity,
        { spoolId: spool.id, organisationId: actor.organisationId, state: 'issued' },
        { state: 'superseded', updatedAt: now },
      );
      await m.update(
        SpoolRevisionEntity,
        { id: draft.id, organisationId: actor.organisationId, state: 'draft' },
        {
          state: 'issued',
          issuedAt: now,
          ...(input.note !== undefined ? { note: input.note } : {}),
          version: draft.version + 1,
          updatedAt: now,
        },
      );
      await m.update(
        SpoolEntity,
        { id: spool.id, organisationId: actor.organisationId },
        {
          currentRevisionId: draft.id,
          status: rework ? rework.toStatus : spool.status === 'drafting' ? 'issued' : spool.status,
          ...(rework ? { rework } : {}),
          version: spool.version + 1,
          updatedAt: now,
        },
      );
      await this.audit(m, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: 'revision.issue',
        entityType: 'spool_revision',
        entityId: draft.id,
        details: {
          spoolId: spool.id,
          letter: draft.letter,
          supersededCount: superseded.affected ?? 0,
          ...(rework
            ? { rework: { from: rework.fromStatus, to: rework.toStatus, changes: rework.changes.length } }
            : {}),
        },
      });
      return toRevisionDto((await this.findOne(m, actor, { id: draft.id }))!);
    });
  }

  /**
   * The rework flag a draft issued over work in progress sets, or null. Issuing over work
   * the bay has done needs the issuer to confirm the stage the spool goes back to:
   * 409 `rework_confirmation_required` names it (with the changes) until they do.
   */
  private async reworkOnIssue(
    m: EntityManager,
    actor: SessionActor,
    spool: SpoolRow,
    draft: RevisionWithAuthor,
    input: DraftIssue,
  ): Promise<SpoolRework | null> {
    if (!spool.currentRevisionId || spool.status === 'drafting' || spool.status === 'issued') return null;
    const issued = await m.getRepository(SpoolRevisionEntity).findOneBy({
      id: spool.currentRevisionId,
      organisationId: actor.organisationId,
    });
    const job = await m.getRepository(JobEntity).findOneBy({ id: spool.jobId, organisationId: actor.organisationId });
    if (!issued || !job) return null;
    const need = reworkNeed(spool.status, issued.design, draft.design, job);
    if (!need) return null;
    if (input.confirmReworkTo !== need.toStatus) {
      const back =
        need.toStatus === spool.status
          ? `stays ${spool.status} and is flagged for rework`
          : `goes back from ${spool.status} to ${need.toStatus}`;
      throw new AppError(
        409,
        'rework_confirmation_required',
        `Spool ${spool.mark} is ${spool.status}. Issuing revision ${draft.letter} changes work the bay has done: the spool ${back}. Confirm to issue.`,
        {
          from: spool.status,
          to: need.toStatus,
          letter: draft.letter,
          sinceLetter: issued.letter,
          changes: need.changes,
        } satisfies ReworkConfirmation,
      );
    }
    return {
      letter: draft.letter,
      sinceLetter: issued.letter,
      fromStatus: spool.status,
      toStatus: need.toStatus,
      changes: need.changes,
      flaggedAt: new Date().toISOString(),
    };
  }

  private async lockDraft(
    m: EntityManager,
    actor: SessionActor,
    spoolId: string,
  ): Promise<RevisionWithAuthor> {
    const locked = await m
      .getRepository(SpoolRevisionEntity)
      .createQueryBuilder('r')
      .where('r.spoolId = :spoolId AND r.organisationId = :org AND r.state = :state', {
        spoolId,
        org: actor.organisationId,
        state: 'draft',
      })
      .setLock('pessimistic_write')
      .getOne();
    if (!locked) throw notFound('Draft of this spool');
    return (await this.findOne(m, actor, { id: locked.id }))!;
  }

  private query(m: EntityManager, actor: SessionActor) {
    return m
      .getRepository(SpoolRevisionEntity)
      .createQueryBuilder('r')
      .leftJoin(UserEntity.options.name, 'a', 'a.id = r.authorId')
      .addSelect('a.displayName', 'author_name')
      .where('r.organisationId = :org', { org: actor.organisationId });
  }

  private async findOne(
    m: EntityManager,
    actor: SessionActor,
    where: Partial<Pick<SpoolRevisionRow, 'id' | 'spoolId' | 'state'>>,
  ): Promise<RevisionWithAuthor | null> {
    const qb = this.query(m, actor);
    if (where.id) qb.andWhere('r.id = :id', { id: where.id });
    if (where.spoolId) qb.andWhere('r.spoolId = :spoolId', { spoolId: where.spoolId });
    if (where.state) qb.andWhere('r.state = :state', { state: where.state });
    return withAuthors(await qb.getRawAndEntities())[0] ?? null;
  }
}

function withAuthors(result: {
  entities: SpoolRevisionRow[];
  raw: Array<Record<string, unknown>>;
}): RevisionWithAuthor[] {
  return result.entities.map((e, i) => ({ ...e, authorName: String(result.raw[i]?.author_name ?? '') }));
}
