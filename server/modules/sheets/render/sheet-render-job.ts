import { computeSpool } from '../../../../shared/engine/compute-spool';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { PaperSize } from '../../../../shared/schemas/sheet-query.schema';
import type { RevisionState } from '../../../../shared/schemas/revision.schema';
import { z } from 'zod';
import { spoolNodeSchema } from '../../../../shared/schemas/spool-design-node.schema';
import { spoolRunSchema } from '../../../../shared/schemas/spool-design-run.schema';
import {
  spoolDesignObjectSchema,
  spoolDesignSchema,
  type SpoolDesign,
} from '../../../../shared/schemas/spool-design.schema';
import type { SpecOverrides } from '../../../../shared/schemas/spool-design-spec.schema';
import type { LengthUnits } from '../../../../shared/units/length-format';
import { revisionChanges } from '../pdf/revision-changes';
import { renderSawList, type SawListInput } from '../pdf/saw-list';
import type { SawListSpool } from '../pdf/saw-list-groups';
import type { SheetHeader } from '../pdf/sheet-header';
import { renderSpoolSheet } from '../pdf/spool-sheet';

/**
 * One sheet to draw, as plain data (it crosses to a render thread by structured clone):
 * the stored designs as read from the database, and everything else the sheet prints.
 * Validation and the engine run happen on the render thread too, so a large design never
 * holds up the request thread.
 */
export type SheetRenderJob =
  | {
      kind: 'spool-sheet';
      header: SheetHeader;
      /** The printed revision's stored design (validated here). */
      design: unknown;
      /** The issued revision before it, for "changed since", when there is one. */
      previous: { letter: string; design: unknown } | null;
      /** Set when this revision sent the spool back for rework. */
      rework?: { fromStatus: string; toStatus: string } | null;
      jobSpec: SpecOverrides;
      units: LengthUnits;
      paper: PaperSize;
    }
  | {
      kind: 'saw-list';
      header: Omit<SawListInput, 'spools'>;
      spools: { mark: string; revisionLetter: string; revisionState: RevisionState; design: unknown }[];
      jobSpec: SpecOverrides;
    };

/** What a render answers: the PDF, or why the stored design cannot be drawn (a 422). */
export type SheetRenderOutcome =
  { ok: true; pdf: Uint8Array; pageCount: number } | { ok: false; message: string; details?: unknown };

class UndrawableDesign extends Error {
  constructor(
    message: string,
    readonly details: unknown,
  ) {
    super(message);
  }
}

/**
 * Size limit before the design limits were lowered: a revision stored then (even issued) may
 * hold up to this many nodes and must still print. The render thread's own time and memory
 * limits bound the work.
 */
const STORED_BEFORE_LIMITS_MAX = 5000;
const storedBeforeLimitsSchema = spoolDesignObjectSchema.extend({
  nodes: z.array(spoolNodeSchema).min(1).max(STORED_BEFORE_LIMITS_MAX),
  runs: z.array(spoolRunSchema).max(STORED_BEFORE_LIMITS_MAX),
});

function idsUnique(design: SpoolDesign): boolean {
  const ids = new Set<string>();
  for (const { id } of [...design.nodes, ...design.runs]) {
    if (ids.has(id)) return false;
    ids.add(id);
  }
  return true;
}

/** The stored design, validated; one over today's size limits but otherwise valid still prints. */
export function parseStoredDesign(design: unknown, letter: string): SpoolDesign {
  const parsed = spoolDesignSchema.safeParse(design);
  if (parsed.success) return parsed.data;
  const sizeOnly = parsed.error.issues.every(
    (i) => i.code === 'too_big' && i.path.length === 1 && (i.path[0] === 'nodes' || i.path[0] === 'runs'),
  );
  const older = sizeOnly ? storedBeforeLimitsSchema.safeParse(design) : null;
  if (older?.success && idsUnique(older.data)) return older.data;
  // Stored designs are validated on save; one that fails now predates a schema change.
  throw new UndrawableDesign(
    `Revision ${letter} does not hold a valid spool design, so no sheet can be drawn from it.`,
    { issues: parsed.error.issues },
  );
}

function compute(design: SpoolDesign, jobSpec: SpecOverrides): SpoolResult {
  return computeSpool(design, { jobSpec, trusted: true });
}

async function renderSpool(
  job: Extract<SheetRenderJob, { kind: 'spool-sheet' }>,
): Promise<SheetRenderOutcome> {
  const design = parseStoredDesign(job.design, job.header.revision.letter);
  const result = compute(design, job.jobSpec);
  let changes = null;
  if (job.previous) {
    // An older design that no longer reads gives no change list rather than no sheet.
    let older: SpoolDesign | null;
    try {
      older = parseStoredDesign(job.previous.design, job.previous.letter);
    } catch {
      older = null;
    }
    if (older)
      changes = {
        ...revisionChanges(
          { design: older, result: compute(older, job.jobSpec) },
          { design, result },
          job.units,
          job.previous.letter,
          job.header.revision.letter,
        ),
        ...(job.rework ? { rework: job.rework } : {}),
      };
  }
  const out = await renderSpoolSheet({
    header: job.header,
    design,
    result,
    units: job.units,
    paper: job.paper,
    changes,
  });
  return {
    ok: true,
    pdf: new Uint8Array(out.pdf.buffer, out.pdf.byteOffset, out.pdf.byteLength),
    pageCount: out.pageCount,
  };
}

async function renderSaw(job: Extract<SheetRenderJob, { kind: 'saw-list' }>): Promise<SheetRenderOutcome> {
  const spools: SawListSpool[] = job.spools.map((s) => ({
    mark: s.mark,
    revisionLetter: s.revisionLetter,
    revisionState: s.revisionState,
    result: compute(parseStoredDesign(s.design, s.revisionLetter), job.jobSpec),
  }));
  const out = await renderSawList({ ...job.header, spools });
  return {
    ok: true,
    pdf: new Uint8Array(out.pdf.buffer, out.pdf.byteOffset, out.pdf.byteLength),
    pageCount: out.pageCount,
  };
}

/** Validates, computes and draws one sheet. Runs on a render thread (or inline in tests). */
export async function runSheetRenderJob(job: SheetRenderJob): Promise<SheetRenderOutcome> {
  try {
    return job.kind === 'spool-sheet' ? await renderSpool(job) : await renderSaw(job);
  } catch (err) {
    if (err instanceof UndrawableDesign) return { ok: false, message: err.message, details: err.details };
    throw err;
  }
}
