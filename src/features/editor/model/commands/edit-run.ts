import type { SpoolDesign } from '../../../../../shared/schemas/spool-design.schema';
import type { Vec3 } from '../../../../../shared/schemas/spool-design-primitives.schema';
import type { RunLengthKind, SpoolRun } from '../../../../../shared/schemas/spool-design-run.schema';
import type { SpecOverrides } from '../../../../../shared/schemas/spool-design-spec.schema';
import type { Nps } from '../../../../../shared/standards/nps';
import { incomingRun, nodeById, outgoingRuns, runById } from '../design-graph';
import { inferredLengthKind, tidyMm, withNode, withRun } from '../design-edit';
import { describeDirection } from '../plant-directions';
import { angleBetweenDeg, normalise, tidy, vecLength } from '../vector';
import { continuesLine, effectiveNps, isThroughRun } from '../line-size';
import { selectRun } from '../editor-selection';
import { done, fail, type CommandResult } from './command-result';
import { lengthError } from './length-rules';
import { followNewSize } from './insert-on-run';

/**
 * Changes a run's stated length (and optionally what it measures). Everything
 * downstream moves with it: positions are derived, never stored.
 */
export function setRunLength(design: SpoolDesign, args: { runId: string; lengthMm: number; lengthKind?: RunLengthKind }): CommandResult {
  const run = runById(design, args.runId);
  if (!run) return fail(`No run "${args.runId}" in this spool`);
  const kind = args.lengthKind ?? run.length.kind;
  const bad = lengthError(args.lengthMm, kind);
  if (bad) return fail(bad);
  const mm = tidyMm(args.lengthMm);
  let next: SpoolRun = { ...run, length: { mm, kind } };
  // Leaving `cut` for a work-point kind: use the kind the ends call for.
  if (run.length.kind === 'cut' && kind !== 'cut' && args.lengthKind === undefined) {
    next = { ...next, length: { mm, kind: inferredLengthKind(design, { ...next, length: { mm, kind: 'centre-to-centre' } }) } };
  }
  const label = kind === 'cut' ? `Set ${run.id} cut length to ${mm} mm` : `Set ${run.id} to ${mm} mm ${kind}`;
  return done(withRun(design, next), label, { select: selectRun(run.id) });
}

/**
 * Points a run in a new direction. Elbows at either end take the new angle; a turn no
 * elbow makes (over 90°, or none at all) is refused here rather than left for the engine.
 */
export function setRunDirection(design: SpoolDesign, args: { runId: string; direction: Vec3 }): CommandResult {
  const run = runById(design, args.runId);
  if (!run) return fail(`No run "${args.runId}" in this spool`);
  if (vecLength(args.direction) < 1e-9) return fail('Choose a direction');
  const dir = tidy(normalise(args.direction));
  const fromNode = nodeById(design, run.from);
  const toNode = nodeById(design, run.to);
  const checks: [Vec3, Vec3, string][] = [];
  const feeding = incomingRun(design, run.from);
  if (fromNode?.kind === 'elbow' && feeding) checks.push([feeding.direction, dir, run.from]);
  if (toNode?.kind === 'elbow') for (const out of outgoingRuns(design, run.to)) checks.push([dir, out.direction, run.to]);
  if (fromNode && fromNode.kind !== 'elbow' && fromNode.kind !== 'end' && fromNode.kind !== 'return' && feeding) {
    if (isThroughRun(design, run.id)) return fail(`Run ${run.id} passes straight through ${fromNode.kind} ${fromNode.id}; turn it with an elbow after the fitting`);
  }
  for (const [a, b, at] of checks) {
    const turn = angleBetweenDeg(a, b);
    if (turn < 0.01) return fail(`Elbow ${at} would turn 0°: the runs would be in line`);
    if (turn > 90.01) return fail(`Elbow ${at} would turn ${turn.toFixed(1)}°; one elbow turns at most 90°`);
  }
  return done(withRun(design, { ...run, direction: dir }), `Point ${run.id} ${describeDirection(dir)}`, { select: selectRun(run.id) });
}

/** Free properties of a run: label, heat number, spec overrides. Empty strings clear. */
export function setRunProperties(
  design: SpoolDesign,
  args: { runId: string; label?: string | null; heat?: string | null; spec?: SpecOverrides | null },
): CommandResult {
  const run = runById(design, args.runId);
  if (!run) return fail(`No run "${args.runId}" in this spool`);
  const next: SpoolRun = { ...run };
  for (const key of ['label', 'heat'] as const) {
    const v = args[key];
    if (v === undefined) continue;
    if (v === null || v.trim() === '') delete next[key];
    else next[key] = v.trim();
  }
  if (args.spec !== undefined) {
    if (args.spec === null || Object.keys(args.spec).length === 0) delete next.spec;
    else next.spec = args.spec;
  }
  return done(withRun(design, next), `Edit ${run.id}`, { select: selectRun(run.id) });
}

/**
 * Changes the size of the line this run belongs to, from where that line starts (the
 * spool's start, a reducer or a branch) down to the next reducer or branch. To change
 * size part-way along a run, insert a reducer instead.
 */
export function setLineSize(design: SpoolDesign, args: { runId: string; nps: Nps }): CommandResult {
  const run = runById(design, args.runId);
  if (!run) return fail(`No run "${args.runId}" in this spool`);
  const oldNps = effectiveNps(design, run.id);
  if (oldNps === args.nps) return fail(`The line is already NPS ${args.nps}`);
  // Walk up to the first run of this line.
  let first = run;
  for (let guard = 0; guard < design.runs.length && continuesLine(design, first.id); guard++) {
    first = incomingRun(design, first.from)!;
  }
  let next = design;
  const from = nodeById(design, first.from);
  const feeding = incomingRun(design, first.from);
  if (from?.kind === 'reducer') {
    next = withNode(next, { ...from, toNps: args.nps });
  } else if (!feeding) {
    next = { ...next, spec: { ...next.spec, nps: args.nps } };
    if (first.nps) next = withRun(next, { ...first, nps: args.nps });
  } else {
    // A branch line: its first run states the size, and a tee says its branch size.
    next = withRun(next, { ...first, nps: args.nps });
    if (from?.kind === 'tee') next = withNode(next, { ...from, branchNps: args.nps });
    if (from?.kind === 'half-coupling' || from?.kind === 'branch-outlet') next = withNode(next, { ...from, branchNps: args.nps });
  }
  next = followNewSize(next, first.id, oldNps, args.nps);
  return done(next, `Change line size to NPS ${args.nps}`, { select: selectRun(run.id) });
}
