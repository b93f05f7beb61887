import {
  SPOOL_DESIGN_FORMAT,
  SPOOL_DESIGN_VERSION,
  type SpoolDesign,
} from '../../../../../shared/schemas/spool-design.schema';
import type { EndSpec } from '../../../../../shared/schemas/spool-design-node.schema';
import type { SpecOverrides } from '../../../../../shared/schemas/spool-design-spec.schema';
import type { Vec3 } from '../../../../../shared/schemas/spool-design-primitives.schema';
import type { Nps } from '../../../../../shared/standards/nps';
import type { IdAllocator } from '../id-allocator';
import { selectNode } from '../editor-selection';
import { done, fail, type CommandResult } from './command-result';

/** Arguments of {@link startSpool}. */
export type StartSpoolArgs = {
  nps: Nps;
  /** What sits at the first open end: a flange, a bevel end, a cap… */
  end: EndSpec;
  origin?: Vec3;
  /** Design-wide spec (schedule, class, gaps) from the job. */
  spec?: SpecOverrides;
  mark?: string;
};

/**
 * Starts a new design from one open end. It replaces whatever design was open; the
 * editor keeps the old one on the undo stack.
 */
export function startSpool(args: StartSpoolArgs, ids: IdAllocator): CommandResult {
  const id = ids.node();
  const design: SpoolDesign = {
    format: SPOOL_DESIGN_FORMAT,
    version: SPOOL_DESIGN_VERSION,
    ...(args.mark ? { mark: args.mark } : {}),
    spec: { ...args.spec, nps: args.nps },
    origin: args.origin ?? { x: 0, y: 0, z: 0 },
    nodes: [{ id, kind: 'end', end: args.end }],
    runs: [],
  };
  return done(design, `Start NPS ${args.nps} spool`, { select: selectNode(id) });
}

/**
 * Begins the line on a design that is still just one open end (a new draft): sets the
 * main size and what sits at that end, keeping the document's mark and origin.
 */
export function beginLine(design: SpoolDesign, args: { nps: Nps; end: EndSpec }): CommandResult {
  if (design.runs.length > 0 || design.nodes.length !== 1) return fail('The spool is already begun: extend it from an open end');
  const start = design.nodes[0]!;
  if (start.kind !== 'end') return fail('The start must be an open end');
  const next: SpoolDesign = { ...design, spec: { ...design.spec, nps: args.nps }, nodes: [{ ...start, end: args.end }] };
  return done(next, `Start NPS ${args.nps} line`, { select: selectNode(start.id) });
}
