import type { SpoolDesign } from '../../../../../shared/schemas/spool-design.schema';
import type { Vec3 } from '../../../../../shared/schemas/spool-design-primitives.schema';
import type { EndSpec, SpoolNode } from '../../../../../shared/schemas/spool-design-node.schema';
import type { RunLengthKind, SpoolRun } from '../../../../../shared/schemas/spool-design-run.schema';
import { compareNps, type Nps } from '../../../../../shared/standards/nps';
import { runById } from '../design-graph';
import { refreshLengthKinds, tidyMm, workPointDistance } from '../design-edit';
import { continuesLine, effectiveNps } from '../line-size';
import { angleBetweenDeg, normalise, perpendicular, tidy, vecLength } from '../vector';
import { selectNode } from '../editor-selection';
import type { CommandContext } from './command-context';
import { done, fail, type CommandResult } from './command-result';
import { lengthError } from './length-rules';

/** A fitting that sits on a straight run. */
export type InlineComponent =
  | { kind: 'tee'; branchNps?: Nps }
  | { kind: 'set-on-branch' }
  | { kind: 'half-coupling'; branchNps: Nps; orientationDeg?: number }
  | { kind: 'branch-outlet'; branchNps: Nps; outletEnd: 'butt' | 'socket'; heightMm: number; orientationDeg?: number }
  | { kind: 'reducer'; toNps: Nps; type?: 'concentric' | 'eccentric'; flatSide?: 'top' | 'bottom' };

/** The branch run to add with a tee, set-on branch or outlet. */
export type BranchArgs = {
  direction: Vec3;
  lengthMm: number;
  lengthKind?: RunLengthKind;
  /** Branch pipe size (a set-on branch's size; defaults to the tee's branch size). */
  nps?: Nps;
  end?: EndSpec;
};

/** Arguments of {@link insertOnRun}. */
export type InsertOnRunArgs = {
  runId: string;
  /** Distance from the run's `from` work point to the new fitting's work point, mm. */
  distanceMm: number;
  component: InlineComponent;
  branch?: BranchArgs;
};

/** Smallest angle between a set-on branch and its header, degrees (document rule). */
const MIN_SET_ON_ANGLE_DEG = 30;

/**
 * Splits a run at `distanceMm` and puts a fitting there: a tee, a set-on branch, a
 * socket (half coupling), a branch outlet, or a reducer (a size change mid-run). The
 * downstream part keeps the run's far end where it was. With `branch`, the branch run
 * and its open end are added too; continue the branch from that end.
 */
export function insertOnRun(design: SpoolDesign, args: InsertOnRunArgs, ctx: CommandContext): CommandResult {
  const run = runById(design, args.runId);
  if (!run) return fail(`No run "${args.runId}" in this spool`);
  const total = workPointDistance(run, ctx.result);
  if (total === null) return fail(`Run ${run.id} cannot be placed yet; fix its errors first`);
  const d = tidyMm(args.distanceMm);
  if (!Number.isFinite(d) || d <= 0 || d >= total) {
    return fail(`Put it between the run's two work points: more than 0 and less than ${tidyMm(total)} mm`);
  }
  const headerNps = effectiveNps(design, run.id);
  const c = args.component;
  const needsBranch = c.kind === 'tee' || c.kind === 'set-on-branch';
  if (needsBranch && !args.branch) return fail(`A ${c.kind === 'tee' ? 'tee' : 'set-on branch'} needs its branch run`);
  if (c.kind === 'reducer') {
    if (args.branch) return fail('A reducer has no branch');
    if (headerNps && compareNps(c.toNps, headerNps) === 0) return fail(`The run is already NPS ${headerNps}`);
  }

  let branchNps: Nps | undefined;
  if (args.branch) {
    const b = args.branch;
    if (vecLength(b.direction) < 1e-9) return fail('Choose a direction for the branch');
    const bad = lengthError(b.lengthMm, b.lengthKind ?? 'centre-to-face');
    if (bad) return fail(`Branch: ${bad}`);
    const angle = angleBetweenDeg(run.direction, b.direction);
    if (c.kind === 'tee' && !perpendicular(run.direction, b.direction)) {
      return fail('A tee branch leaves the run at 90°; choose a direction square to the run');
    }
    if (c.kind === 'set-on-branch' && (angle < MIN_SET_ON_ANGLE_DEG || angle > 180 - MIN_SET_ON_ANGLE_DEG)) {
      return fail(`A set-on branch meets its header at ${MIN_SET_ON_ANGLE_DEG}° or more; this one is ${angle.toFixed(1)}°`);
    }
    if ((c.kind === 'half-coupling' || c.kind === 'branch-outlet') && !perpendicular(run.direction, b.direction)) {
      return fail('A socket or outlet branch leaves the header at 90°');
    }
    if (c.kind === 'tee') branchNps = c.branchNps ?? b.nps ?? headerNps ?? undefined;
    else if (c.kind === 'set-on-branch') branchNps = b.nps ?? headerNps ?? undefined;
    else if (c.kind === 'half-coupling' || c.kind === 'branch-outlet') branchNps = c.branchNps;
    if (!branchNps) return fail('State the branch size');
    if (headerNps && compareNps(branchNps, headerNps) > 0) {
      return fail(`The branch (NPS ${branchNps}) cannot be larger than its header (NPS ${headerNps})`);
    }
  }

  const nodeId = ctx.ids.node();
  const downId = ctx.ids.run();
  const node = buildNode(nodeId, c);
  const upstream: SpoolRun = { ...run, to: nodeId, length: { mm: d, kind: 'centre-to-centre' } };
  const downstream: SpoolRun = {
    id: downId,
    from: nodeId,
    to: run.to,
    direction: run.direction,
    length: { mm: tidyMm(total - d), kind: 'centre-to-centre' },
    // Below a reducer the size comes from its toNps; elsewhere the run keeps its size.
    ...(c.kind !== 'reducer' && run.nps ? { nps: run.nps } : {}),
    ...(run.spec ? { spec: run.spec } : {}),
    ...(run.heat ? { heat: run.heat } : {}),
  };
  const nodes: SpoolNode[] = [...design.nodes, node];
  const runs: SpoolRun[] = design.runs.flatMap((r) => (r.id === run.id ? [upstream, downstream] : [r]));
  let tipId: string | null = null;
  if (args.branch) {
    tipId = ctx.ids.node();
    nodes.push({ id: tipId, kind: 'end', end: args.branch.end ?? { type: 'bevel' } });
    runs.push({
      id: ctx.ids.run(),
      from: nodeId,
      to: tipId,
      direction: tidy(normalise(args.branch.direction)),
      length: { mm: tidyMm(args.branch.lengthMm), kind: args.branch.lengthKind ?? 'centre-to-face' },
      ...(branchNps ? { nps: branchNps } : {}),
    });
  }
  let next: SpoolDesign = { ...design, nodes, runs };
  next = refreshLengthKinds(next, [nodeId, run.from, run.to]);
  if (c.kind === 'reducer') next = followNewSize(next, downId, headerNps, c.toNps);
  const what = describeInline(c);
  return done(next, `Insert ${what} on ${run.id} at ${d} mm`, { select: selectNode(tipId ?? nodeId) });
}

function buildNode(id: string, c: InlineComponent): SpoolNode {
  switch (c.kind) {
    case 'tee':
      return { id, kind: 'tee', ...(c.branchNps ? { branchNps: c.branchNps } : {}) };
    case 'set-on-branch':
      return { id, kind: 'set-on-branch' };
    case 'half-coupling':
      return { id, kind: 'half-coupling', branchNps: c.branchNps, ...(c.orientationDeg !== undefined ? { orientationDeg: c.orientationDeg } : {}) };
    case 'branch-outlet':
      return {
        id,
        kind: 'branch-outlet',
        branchNps: c.branchNps,
        outletEnd: c.outletEnd,
        heightMm: c.heightMm,
        ...(c.orientationDeg !== undefined ? { orientationDeg: c.orientationDeg } : {}),
      };
    case 'reducer':
      return { id, kind: 'reducer', toNps: c.toNps, ...(c.type ? { type: c.type } : {}), ...(c.flatSide ? { flatSide: c.flatSide } : {}) };
  }
}

/** Plain words for an inline component. */
export function describeInline(c: InlineComponent): string {
  switch (c.kind) {
    case 'tee':
      return c.branchNps ? `reducing tee (branch NPS ${c.branchNps})` : 'tee';
    case 'set-on-branch':
      return 'set-on branch';
    case 'half-coupling':
      return `NPS ${c.branchNps} socket`;
    case 'branch-outlet':
      return `NPS ${c.branchNps} branch outlet`;
    case 'reducer':
      return `reducer to NPS ${c.toNps}`;
  }
}

/**
 * Runs below a new reducer that state the old size explicitly would contradict it:
 * they take the new size, down to the next reducer or branch.
 */
export function followNewSize(design: SpoolDesign, firstRunId: string, oldNps: Nps | null, newNps: Nps): SpoolDesign {
  if (!oldNps) return design;
  const change = new Set<string>();
  const stack = [firstRunId];
  while (stack.length) {
    const id = stack.pop()!;
    const r = runById(design, id);
    if (!r || change.has(id)) continue;
    if (r.nps && r.nps !== oldNps) continue;
    change.add(id);
    for (const next of design.runs) {
      if (next.from === r.to && continuesLine(design, next.id)) stack.push(next.id);
    }
  }
  return {
    ...design,
    runs: design.runs.map((r) => (change.has(r.id) && r.nps ? { ...r, nps: newNps } : r)),
  };
}
