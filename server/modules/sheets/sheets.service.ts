import { IsNull, type DataSource } from 'typeorm';
import { computeSpool } from '../../../shared/engine/compute-spool';
import type { SpoolResult } from '../../../shared/engine/compute-result';
import type { Job } from '../../../shared/schemas/job.schema';
import type { Revision, RevisionSummary } from '../../../shared/schemas/revision.schema';
import { spoolDesignSchema, type SpoolDesign } from '../../../shared/schemas/spool-design.schema';
import type { SpecOverrides } from '../../../shared/schemas/spool-design-spec.schema';
import type { Spool } from '../../../shared/schemas/spool.schema';
import { scheduleSchema } from '../../../shared/standards/pipe-schedules';
import { notFound, unprocessable } from '../../common/app-error';
import type { SessionActor } from '../../common/session-actor';
import type { JobService } from '../jobs/job.service';
import type { RevisionService } from '../revisions/revision.service';
import { SpoolEntity } from '../spools/spool.entity';
import type { SpoolService } from '../spools/spool.service';
import { revisionChanges, type RevisionChanges } from './pdf/revision-changes';
import { renderSawList } from './pdf/saw-list';
import type { SawListSpool } from './pdf/saw-list-groups';
import type { RevisionHistoryEntry, SheetHeader } from './pdf/sheet-header';
import { renderSpoolSheet } from './pdf/spool-sheet';
import { MAX_SAW_LIST_SPOOLS, type SawListQuery, type SpoolSheetQuery } from '../../../shared/schemas/sheet-query.schema';

/** A rendered PDF and the file name to offer. */
export interface RenderedPdf {
  pdf: Buffer;
  filename: string;
}

/** The job's defaults as engine spec overrides (only the values the engine's tables carry). */
export function jobSpecOverrides(job: Pick<Job, 'spec'>): SpecOverrides {
  const out: SpecOverrides = {
    material: job.spec.material,
    rootGapMm: job.spec.rootGapMm,
    sawKerfMm: job.spec.sawKerfMm,
    minPieceLengthMm: job.spec.minPieceLengthMm,
  };
  const schedule = scheduleSchema.safeParse(job.spec.schedule);
  if (schedule.success) out.schedule = schedule.data;
  // Passed on as stored, never swapped for another: the engine refuses a class without a table.
  out.flangeClass = job.spec.flangeClass;
  if (job.spec.gasketType) out.gasketType = job.spec.gasketType;
  if (job.spec.boltingMaterial) out.boltingMaterial = job.spec.boltingMaterial;
  return out;
}

/**
 * Which revision a sheet prints when none is asked for: the latest issued one (what the bay
 * builds from), else the working draft (marked DRAFT). A detailer asks for the draft by id.
 */
export function defaultRevisionId(spool: Spool): string | null {
  return spool.currentRevision?.id ?? spool.draft?.id ?? null;
}

function historyEntry(r: RevisionSummary): RevisionHistoryEntry {
  return {
    letter: r.letter,
    state: r.state,
    issuedAt: r.issuedAt,
    note: r.note,
    author: r.author.displayName,
  };
}

/** Builds spool sheets and job saw lists from stored designs and the geometry engine. */
export class SheetsService {
  constructor(
    private readonly ds: DataSource,
    private readonly jobs: JobService,
    private readonly spools: SpoolService,
    private readonly revisions: RevisionService,
    private readonly publicUrl: string,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async spoolSheet(actor: SessionActor, spoolId: string, query: SpoolSheetQuery): Promise<RenderedPdf> {
    const spool = await this.spools.get(actor, spoolId);
    const job = await this.jobs.get(actor, spool.jobId);
    const history = await this.revisions.list(actor, spool.id);
    const revisionId = query.revision ?? defaultRevisionId(spool);
    if (!revisionId) throw unprocessable('This spool has no design yet: open a draft and lay it out first.');
    if (!history.some((r) => r.id === revisionId)) throw notFound('Revision');
    const revision = await this.revisions.get(actor, spool.id, revisionId);
    const { design, result } = this.compute(revision, job);

    const header: SheetHeader = {
      shopName: actor.organisationName,
      clientName: job.client,
      jobNumber: job.number,
      jobTitle: job.title,
      site: job.site,
      spoolMark: spool.mark,
      lineNumber: spool.lineNumber,
      spoolStatus: spool.status,
      revision: historyEntry(revision),
      history: history.map(historyEntry),
      drawnBy: revision.author.displayName,
      checkedBy: null,
      spoolUrl: `${this.publicUrl.replace(/\/+$/, '')}/spools/${spool.id}`,
      printedAt: this.now(),
    };
    const changes = await this.changesSincePrevious(actor, spool.id, history, revision, result, job);
    const out = await renderSpoolSheet({
      header,
      design,
      result,
      units: job.units,
      paper: query.paper,
      changes,
    });
    return {
      pdf: out.pdf,
      filename: `${spool.mark}-rev-${revision.letter}${revision.state === 'issued' ? '' : `-${revision.state}`}.pdf`,
    };
  }

  async sawList(actor: SessionActor, jobId: string, query: SawListQuery): Promise<RenderedPdf> {
    const job = await this.jobs.get(actor, jobId);
    const ids = query.spools ?? (await this.openSpoolIds(actor, job.id));
    const chosen: SawListSpool[] = [];
    const skipped: string[] = [];
    for (const id of ids) {
      const spool = await this.spools.get(actor, id);
      // Another job's spool is "not found" here, as another shop's is.
      if (spool.jobId !== job.id) throw notFound(`Spool ${id} in this job`);
      const revisionId = defaultRevisionId(spool);
      if (!revisionId) {
        skipped.push(spool.mark);
        continue;
      }
      const revision = await this.revisions.get(actor, spool.id, revisionId);
      const { result } = this.compute(revision, job);
      chosen.push({
        mark: spool.mark,
        revisionLetter: revision.letter,
        revisionState: revision.state,
        result,
      });
    }
    chosen.sort((a, b) => a.mark.localeCompare(b.mark, undefined, { numeric: true }));
    const out = await renderSawList({
      shopName: actor.organisationName,
      clientName: job.client,
      jobNumber: job.number,
      jobTitle: job.title,
      site: job.site,
      jobUrl: `${this.publicUrl.replace(/\/+$/, '')}/jobs/${job.id}`,
      units: job.units,
      paper: query.paper,
      spools: chosen,
      skipped,
      printedAt: this.now(),
    });
    return { pdf: out.pdf, filename: `${job.number}-saw-list.pdf` };
  }

  /**
   * What changed since the issued revision before the printed one (for a draft: the latest
   * issued). Null for a first revision, or when the older design no longer reads.
   */
  private async changesSincePrevious(
    actor: SessionActor,
    spoolId: string,
    history: RevisionSummary[],
    printed: Revision,
    result: SpoolResult,
    job: Job,
  ): Promise<RevisionChanges | null> {
    const at = history.findIndex((r) => r.id === printed.id);
    const previous = history.slice(at + 1).find((r) => r.state !== 'draft');
    if (!previous) return null;
    const older = await this.revisions.get(actor, spoolId, previous.id);
    const parsed = spoolDesignSchema.safeParse(older.design);
    if (!parsed.success) return null;
    const before = computeSpool(parsed.data, { jobSpec: jobSpecOverrides(job), trusted: true });
    return revisionChanges(before, result, job.units, previous.letter, printed.letter);
  }

  private compute(revision: Revision, job: Job): { design: SpoolDesign; result: SpoolResult } {
    const parsed = spoolDesignSchema.safeParse(revision.design);
    if (!parsed.success) {
      // Stored designs are validated on save; one that fails now predates a schema change.
      throw unprocessable(
        `Revision ${revision.letter} does not hold a valid spool design, so no sheet can be drawn from it.`,
        {
          issues: parsed.error.issues,
        },
      );
    }
    return {
      design: parsed.data,
      result: computeSpool(parsed.data, { jobSpec: jobSpecOverrides(job), trusted: true }),
    };
  }

  private async openSpoolIds(actor: SessionActor, jobId: string): Promise<string[]> {
    const rows = await this.ds.getRepository(SpoolEntity).find({
      select: { id: true },
      where: { organisationId: actor.organisationId, jobId, archivedAt: IsNull() },
      order: { mark: 'ASC' },
      take: MAX_SAW_LIST_SPOOLS,
    });
    return rows.map((r) => r.id);
  }
}
