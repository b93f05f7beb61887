import type { SpoolDesign } from '../../../../../shared/schemas/spool-design.schema';
import type { SpoolNode } from '../../../../../shared/schemas/spool-design-node.schema';
import type { SpoolRun } from '../../../../../shared/schemas/spool-design-run.schema';
import { incomingRun, nodeById, outgoingRuns, runById, subtreeIds } from '../design-graph';
import { inferredLengthKind, refreshLengthKinds, tidyMm, without, withNode, withRun, workPointDistance } from '../design-edit';
import { effectiveNps } from '../line-size';
import { sameDirection, collinear } from '../vector';
import { selectNode } from '../editor-selection';
import type { CommandContext } from './command-context';
import { done, fail, type CommandResult } from './command-result';
import { followNewSize } from './insert-on-run';

/** Node kinds that sit on a straight header and can be taken out by joining the header again. */
const INLINE_KINDS = new Set<SpoolNode['kind']>(['tee', 'set-on-branch', 'half-coupling', 'branch-outlet', 'reducer', 'socket-fitting']);
/** Kinds whose header must continue past them. */
const HEADER_KINDS = new Set<SpoolNode['kind']>(['set-on-branch', 'half-coupling', 'branch-outlet']);

/**
 * What deleting `id` would remove, without doing it: the target and every component
 * downstream that goes with it (a branch's subtree). For the UI's confirmation.
 */
export function deletionPreview(design: SpoolDesign, id: string, ctx: CommandContext): { removedIds: string[]; error?: string } {
  const r = deleteComponent(design, { id }, ctx);
  return r.ok ? { removedIds: r.removedIds ?? [] } : { removedIds: [], error: r.error };
}

/**
 * Deletes a component and says what went with it:
 * - an open end: its run goes too, and the fitting behind it becomes the new open end
 *   (an elbow turns into an end; a tee that loses its branch joins its run again);
 * - a fitting on a straight header (tee, set-on branch, socket, outlet, reducer): the
 *   header is joined up again and any branch off it is removed with its whole subtree;
 * - an elbow or return: everything downstream of it is removed and it becomes an open end;
 * - a run: the run and everything downstream of it.
 * The start end can be deleted when one fitting follows it. Nothing is half-done: an
 * impossible delete returns an error and the design is unchanged.
 */
export function deleteComponent(design: SpoolDesign, args: { id: string }, ctx: CommandContext): CommandResult {
  const run = runById(design, args.id);
  if (run) return deleteRun(design, run, ctx);
  const node = nodeById(design, args.id);
  if (!node) return fail(`No component "${args.id}" in this spool`);
  const feeding = incomingRun(design, node.id);
  const out = outgoingRuns(design, node.id);

  if (!feeding) return deleteRoot(design, node, out);
  if (node.kind === 'end') return deleteRun(design, feeding, ctx, `Delete end ${node.id}`);

  const through = out.find((o) => sameDirection(o.direction, feeding.direction));
  if (INLINE_KINDS.has(node.kind) && through) {
    const removed = new Set<string>([node.id, through.id]);
    for (const o of out) if (o !== through) for (const id of allBelow(design, o)) removed.add(id);
    const joined = joinRuns(design, feeding, through, ctx);
    if (!joined) return fail(`Cannot join ${feeding.id} and ${through.id} until their lengths can be placed`);
    let next = withRun(without(design, removed), joined);
    next = refreshLengthKinds(next, [feeding.from, through.to]);
    if (node.kind === 'reducer') next = followNewSize(next, joined.id, node.toNps, effectiveNps(design, feeding.id) ?? node.toNps);
    const extra = [...removed].filter((id) => id !== node.id && id !== through.id);
    return done(next, labelFor(`Delete ${node.kind} ${node.id}`, extra.length), {
      select: { type: 'run', id: joined.id },
      removedIds: [node.id, ...extra],
    });
  }

  // An elbow, return or a fitting entered from its branch: cut the line here.
  const removed = new Set<string>();
  for (const o of out) for (const id of allBelow(design, o)) removed.add(id);
  const end: SpoolNode = { id: node.id, kind: 'end', end: { type: 'bevel' }, ...(node.label ? { label: node.label } : {}) };
  const next = refreshLengthKinds(withNode(without(design, removed), end), [node.id]);
  return done(next, labelFor(`Delete ${node.kind} ${node.id}`, removed.size), {
    select: selectNode(node.id),
    removedIds: [node.id, ...removed],
  });
}

function deleteRun(design: SpoolDesign, run: SpoolRun, ctx: CommandContext, label?: string): CommandResult {
  const parent = nodeById(design, run.from);
  if (!parent) return fail(`Run ${run.id} starts at a missing node`);
  const removed = new Set(allBelow(design, run));
  const feeding = incomingRun(design, parent.id);
  const through = feeding && sameDirection(run.direction, feeding.direction);
  if (HEADER_KINDS.has(parent.kind) && through) {
    return fail(`The header must carry on past ${parent.kind} ${parent.id}: delete the branch first, or shorten the run`);
  }
  let next = without(design, removed);
  const remaining = next.runs.filter((r) => r.from === parent.id || r.to === parent.id);
  let select = selectNode(parent.id);
  if (parent.kind !== 'end' && feeding) {
    const others = remaining.filter((r) => r.id !== feeding.id);
    if (others.length === 0 && parent.kind === 'socket-fitting') {
      next = withNode(next, { id: parent.id, kind: 'end', end: { type: 'plain' } });
    } else if (others.length === 0) {
      next = withNode(next, { id: parent.id, kind: 'end', end: { type: 'bevel' }, ...(parent.label ? { label: parent.label } : {}) });
    } else if (others.length === 1 && (parent.kind === 'tee' || parent.kind === 'set-on-branch')) {
      const other = others[0]!;
      if (sameDirection(other.direction, feeding.direction)) {
        // The run is whole again: join the two halves.
        const joined = joinRuns(next, feeding, other, ctx);
        if (!joined) return fail(`Cannot join ${feeding.id} and ${other.id} until their lengths can be placed`);
        next = withRun(without(next, new Set([parent.id, other.id])), joined);
        removed.add(parent.id);
        removed.add(other.id);
        select = { type: 'run', id: joined.id };
      } else if (parent.kind === 'tee') {
        // The line now turns at the tee's work point: an elbow takes its place.
        next = withNode(next, { id: parent.id, kind: 'elbow', radius: 'long' });
      }
    }
  }
  next = refreshLengthKinds(next, [parent.id]);
  const removedIds = [...removed];
  return done(next, labelFor(label ?? `Delete run ${run.id}`, Math.max(0, removedIds.length - 2)), { select, removedIds });
}

function deleteRoot(design: SpoolDesign, node: SpoolNode, out: SpoolRun[]): CommandResult {
  if (out.length === 0) return fail('This is the only component: start a new spool instead');
  if (node.kind !== 'end' || out.length !== 1) return fail('Delete this from the other end of the spool');
  const first = out[0]!;
  const next = nodeById(design, first.to);
  if (!next) return fail(`Run ${first.id} ends at a missing node`);
  const after = outgoingRuns(design, next.id);
  if (next.kind !== 'end' && after.length !== 1) {
    return fail(`${next.kind} ${next.id} would become the start; delete from the other end instead`);
  }
  let result = without(design, new Set([node.id, first.id]));
  if (next.kind !== 'end') {
    const size = effectiveNps(design, after[0]!.id);
    result = withNode(result, { id: next.id, kind: 'end', end: node.end, ...(next.label ? { label: next.label } : {}) });
    if (size) result = { ...result, spec: { ...result.spec, nps: size } };
  }
  result = refreshLengthKinds(result, [next.id]);
  return done(result, `Delete start end ${node.id}`, { select: selectNode(next.id), removedIds: [node.id, first.id] });
}

/** The run and everything downstream of it. */
function allBelow(design: SpoolDesign, run: SpoolRun): string[] {
  const below = subtreeIds(design, run.to);
  return [run.id, ...below.nodeIds, ...below.runIds];
}

/** One run in place of two collinear ones meeting at a fitting about to go. */
function joinRuns(design: SpoolDesign, first: SpoolRun, second: SpoolRun, ctx: CommandContext): SpoolRun | null {
  const a = workPointDistance(first, ctx.result);
  const b = workPointDistance(second, ctx.result);
  if (a === null || b === null || !collinear(first.direction, second.direction)) return null;
  const joined: SpoolRun = { ...first, to: second.to, length: { mm: tidyMm(a + b), kind: 'centre-to-centre' } };
  return { ...joined, length: { ...joined.length, kind: inferredLengthKind(design, joined) } };
}

function labelFor(base: string, extraCount: number): string {
  return extraCount > 0 ? `${base} and ${extraCount} component${extraCount === 1 ? '' : 's'} downstream` : base;
}
