import { jobSpecOverrides } from '../../../shared/engine/job-spec-overrides';
import { IsNull, type DataSource } from 'typeorm';
import type { Revision, RevisionSummary } from '../../../shared/schemas/revision.schema';
import type { Spool } from '../../../shared/schemas/spool.schema';
import { notFound, unprocessable } from '../../common/app-error';
import type { SessionActor } from '../../common/session-actor';
import type { JobService } from '../jobs/job.service';
import type { RevisionService } from '../revisions/revision.service';
import { SpoolEntity } from '../spools/spool.entity';
import type { SpoolService } from '../spools/spool.service';
import type { RevisionHistoryEntry, SheetHeader } from './pdf/sheet-header';
import type { SheetRenderJob } from './render/sheet-render-job';
import type { SheetRenderer } from './render/sheet-render-pool';
import {
  MAX_SAW_LIST_SPOOLS,
  type SawListQuery,
  type SpoolSheetQuery,
} from '../../../shared/schemas/sheet-query.schema';

/** A rendered PDF and the file name to offer. */
export interface RenderedPdf {
  pdf: Buffer;
  filename: string;
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
    private readonly renderer: SheetRenderer,
    private readonly now: () => Date = () => new Date(),
  ) {}

  async spoolSheet(actor: SessionActor, spoolId: string, query: SpoolSheetQuery): Promise<RenderedPdf> {
    this.renderer.admit();
    const spool = await this.spools.get(actor, spoolId);
    const job = await this.jobs.get(actor, spool.jobId);
    const history = await this.revisions.list(actor, spool.id);
    const revisionId = query.revision ?? defaultRevisionId(spool);
    if (!revisionId) throw unprocessable('This spool has no design yet: open a draft and lay it out first.');
    if (!history.some((r) => r.id === revisionId)) throw notFound('Revision');
    const revision = await this.revisions.get(actor, spool.id, revisionId);

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
    // Validation, the engine and the drawing all run on a render thread.
    const out = await this.renderer.render({
      kind: 'spool-sheet',
      header,
      design: revision.design,
      previous: await this.previousIssued(actor, spool.id, history, revision),
      // The revision that flagged the spool for rework says so on its sheet.
      rework:
        spool.rework && spool.rework.letter === revision.letter
          ? { fromStatus: spool.rework.fromStatus, toStatus: spool.rework.toStatus }
          : null,
      jobSpec: jobSpecOverrides(job.spec),
      units: job.units,
      paper: query.paper,
    });
    return {
      pdf: out.pdf,
      filename: `${spool.mark}-rev-${revision.letter}${revision.state === 'issued' ? '' : `-${revision.state}`}.pdf`,
    };
  }

  async sawList(actor: SessionActor, jobId: string, query: SawListQuery): Promise<RenderedPdf> {
    this.renderer.admit();
    const job = await this.jobs.get(actor, jobId);
    const ids = query.spools ?? (await this.openSpoolIds(actor, job.id));
    const chosen: Extract<SheetRenderJob, { kind: 'saw-list' }>['spools'] = [];
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
      chosen.push({
        mark: spool.mark,
        revisionLetter: revision.letter,
        revisionState: revision.state,
        design: revision.design,
      });
    }
    chosen.sort((a, b) => a.mark.localeCompare(b.mark, undefined, { numeric: true }));
    const out = await this.renderer.render({
      kind: 'saw-list',
      header: {
        shopName: actor.organisationName,
        clientName: job.client,
        jobNumber: job.number,
        jobTitle: job.title,
        site: job.site,
        jobUrl: `${this.publicUrl.replace(/\/+$/, '')}/jobs/${job.id}`,
        units: job.units,
        paper: query.paper,
        skipped,
        printedAt: this.now(),
      },
      spools: chosen,
      jobSpec: jobSpecOverrides(job.spec),
    });
    return { pdf: out.pdf, filename: `${job.number}-saw-list.pdf` };
  }

  /**
   * The issued revision before the printed one (for a draft: the latest issued), whose
   * design the sheet's "changed since" list compares against. Null for a first revision.
   */
  private async previousIssued(
    actor: SessionActor,
    spoolId: string,
    history: RevisionSummary[],
    printed: Revision,
  ): Promise<{ letter: string; design: unknown } | null> {
    const at = history.findIndex((r) => r.id === printed.id);
    const previous = history.slice(at + 1).find((r) => r.state !== 'draft');
    if (!previous) return null;
    const older = await this.revisions.get(actor, spoolId, previous.id);
    return { letter: previous.letter, design: older.design };
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
