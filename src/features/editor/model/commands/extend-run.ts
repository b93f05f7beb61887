import type { SpoolDesign } from '../../../../../shared/schemas/spool-design.schema';
import type { ElbowRadius, Vec3 } from '../../../../../shared/schemas/spool-design-primitives.schema';
import type { EndSpec, SpoolNode } from '../../../../../shared/schemas/spool-design-node.schema';
import type { RunLengthKind, SpoolRun } from '../../../../../shared/schemas/spool-design-run.schema';
import type { Nps } from '../../../../../shared/standards/nps';
import { incomingRun, nodeById, outgoingRuns, runsAt } from '../design-graph';
import { refreshLengthKinds, tidyMm, withNode } from '../design-edit';
import { describeDirection } from '../plant-directions';
import { angleBetweenDeg, normalise, perpendicular, scale, tidy, vecLength } from '../vector';
import { selectNode } from '../editor-selection';
import type { CommandContext } from './command-context';
import { done, fail, type CommandResult } from './command-result';
import { lengthError } from './length-rules';

/** Arguments of {@link extendRun}. */
export type ExtendRunArgs = {
  /** An open end, or an open socket/outlet (the new run becomes its branch). */
  fromNodeId: string;
  direction: Vec3;
  lengthMm: number;
  /** What the length measures; default: what the two ends call for (e.g. centre-to-face). */
  lengthKind?: RunLengthKind;
  /** Size of the new run when it differs from the line's (a branch off an open socket). */
  nps?: Nps;
  /** Radius of the elbow made where the line turns. Default long. */
  elbowRadius?: ElbowRadius;
  /**
   * Turning straight back: the side the 180° return steps to (square to the run). The
   * old end becomes a return and the new run runs antiparallel, offset by the return's
   * centre-to-centre (ASME B16.9 O).
   */
  returnSide?: Vec3;
};

/** Largest turn one elbow makes, degrees (ASME B16.9 elbows are 90° at most). */
const MAX_ELBOW_DEG = 90;

/**
 * Grows the line from an open end: a new run in `direction`, ending in a new open end
 * that takes over the old end's component (a flange stays at the tip). Where the line
 * turns, the old end becomes an elbow whose angle comes from the two run directions.
 * From the root end the new run is added upstream (its tip becomes the new root).
 */
export function extendRun(design: SpoolDesign, args: ExtendRunArgs, ctx: CommandContext): CommandResult {
  const from = nodeById(design, args.fromNodeId);
  if (!from) return fail(`No component "${args.fromNodeId}" in this spool`);
  const bad = lengthError(args.lengthMm, args.lengthKind ?? 'centre-to-centre');
  if (bad) return fail(bad);
  if (vecLength(args.direction) < 1e-9) return fail('Choose a direction for the new run');
  const dir = tidy(normalise(args.direction));
  const mm = tidyMm(args.lengthMm);
  const words = `${describeDirection(dir)}`;

  // An open socket or branch outlet: the new run is its branch.
  if ((from.kind === 'half-coupling' || from.kind === 'branch-outlet') && runsAt(design, from.id).length === 2) {
    const tipId = ctx.ids.node();
    const runId = ctx.ids.run();
    const run: SpoolRun = {
      id: runId,
      from: from.id,
      to: tipId,
      direction: dir,
      length: { mm, kind: 'centre-to-centre' },
      nps: args.nps ?? from.branchNps,
    };
    let next: SpoolDesign = {
      ...design,
      nodes: [...design.nodes, { id: tipId, kind: 'end', end: { type: 'bevel' } }],
      runs: [...design.runs, run],
    };
    next = applyKind(refreshLengthKinds(next, [tipId]), runId, args.lengthKind);
    return done(next, `Branch ${words} from ${from.id}`, { select: selectNode(tipId) });
  }

  if (from.kind !== 'end') {
    return fail('Extend from an open end: select the end of the line or of a branch');
  }
  const incoming = incomingRun(design, from.id);
  const outgoing = outgoingRuns(design, from.id);
  const tipId = ctx.ids.node();
  const runId = ctx.ids.run();
  const tipEnd: EndSpec = from.end;

  if (!incoming && outgoing.length === 0) {
    // The very first run: the start end stays where it is and the new tip is bevelled.
    const run: SpoolRun = { id: runId, from: from.id, to: tipId, direction: dir, length: { mm, kind: 'centre-to-face' } };
    let next: SpoolDesign = {
      ...design,
      nodes: [...design.nodes, { id: tipId, kind: 'end', end: { type: 'bevel' } }],
      runs: [...design.runs, run],
    };
    next = applyKind(refreshLengthKinds(next, [from.id, tipId]), runId, args.lengthKind);
    return done(next, `Run ${fmt(mm)} ${words}`, { select: selectNode(tipId) });
  }

  // Direction of travel into the old end, and of the new run, both away from the root side.
  if (!incoming) {
    // The root end: the new run comes before it, pointing back towards it.
    const first = outgoing[0]!;
    const reversed = tidy(scale(dir, -1));
    const before: SpoolRun = { id: runId, from: tipId, to: from.id, direction: reversed, length: { mm, kind: 'centre-to-centre' } };
    const problem = turnError(angleBetweenDeg(reversed, first.direction));
    if (problem) return fail(problem);
    return finishTurn(design, from, before, tipId, tipEnd, args, `Run ${fmt(mm)} ${words} before the start`);
  }
  const run: SpoolRun = { id: runId, from: from.id, to: tipId, direction: dir, length: { mm, kind: 'centre-to-centre' } };
  const turn = angleBetweenDeg(incoming.direction, dir);
  if (turn > 179.99 && args.returnSide) {
    if (!perpendicular(args.returnSide, incoming.direction)) return fail('A return steps to one side: choose a side square to the run');
    const ret: SpoolNode = {
      id: from.id,
      kind: 'return',
      ...(from.label ? { label: from.label } : {}),
      radius: args.elbowRadius ?? 'long',
      offsetDirection: tidy(normalise(args.returnSide)),
    };
    let next = withNode(design, ret);
    next = { ...next, nodes: [...next.nodes, { id: tipId, kind: 'end', end: tipEnd }], runs: [...next.runs, run] };
    next = applyKind(refreshLengthKinds(next, [from.id, tipId]), run.id, args.lengthKind);
    return done(next, `Return and run ${fmt(mm)} ${words}`, { select: selectNode(tipId) });
  }
  const problem = turnError(turn);
  if (problem) return fail(problem);
  return finishTurn(design, from, run, tipId, tipEnd, args, `Run ${fmt(mm)} ${words}`);
}

function turnError(turnDeg: number): string | null {
  if (turnDeg < 0.01) return 'That is the direction the line already runs: change the run length instead';
  if (turnDeg > 179.99) return 'That doubles straight back: use a 180° return (choose its side) or two elbows';
  if (turnDeg > MAX_ELBOW_DEG + 0.01) {
    return `One elbow turns at most 90°; this turn is ${turnDeg.toFixed(1)}°. Turn in two steps`;
  }
  return null;
}

function finishTurn(
  design: SpoolDesign,
  from: SpoolNode,
  run: SpoolRun,
  tipId: string,
  tipEnd: EndSpec,
  args: ExtendRunArgs,
  label: string,
): CommandResult {
  const elbow: SpoolNode = {
    id: from.id,
    kind: 'elbow',
    ...(from.label ? { label: from.label } : {}),
    radius: args.elbowRadius ?? 'long',
  };
  let next = withNode(design, elbow);
  next = { ...next, nodes: [...next.nodes, { id: tipId, kind: 'end', end: tipEnd }], runs: [...next.runs, run] };
  next = refreshLengthKinds(next, [from.id, tipId]);
  next = applyKind(next, run.id, args.lengthKind);
  return done(next, label, { select: selectNode(tipId) });
}

function applyKind(design: SpoolDesign, runId: string, kind: RunLengthKind | undefined): SpoolDesign {
  if (!kind) return design;
  return { ...design, runs: design.runs.map((r) => (r.id === runId ? { ...r, length: { ...r.length, kind } } : r)) };
}

function fmt(mm: number): string {
  return `${mm.toLocaleString('en-GB', { maximumFractionDigits: 1 })} mm`;
}
