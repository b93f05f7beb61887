/**
 * Looks up every node's standards dimensions and take-offs (no positions yet): dispatches
 * each node to the take-off step for its kind.
 */
import type { ResolvedSpec } from './compute-result';
import type { SpoolGraph } from './build-graph';
import type { NodeRole } from './classify-nodes';
import { cachedPipeDimensions } from './standards-cache';
import type { PipeDimensions } from '../standards/pipe-schedules';
import { addError, type IssueSink } from './issues';
import type { NodeAnalysis, NodeContext, RunPipe } from './node-analysis';
import type { RunSizes } from './resolve-sizes';
import { applySpec } from './resolve-spec';
import { cachedScheduleLabel } from './standards-cache';
import { mmText, noteUnconfirmed, unconfirmedSink, type UnconfirmedSink } from './unconfirmed-data';
import { analyseElbow, analyseReturn } from './take-offs-bends';
import { analyseSetOn, analyseSmallBore } from './take-offs-branches';
import { analyseEnd } from './take-offs-ends';
import { analyseReducer } from './take-offs-inline';
import { analyseSocketFitting } from './take-offs-sockets';
import { analyseTee } from './take-offs-tees';

/** Pipe size, schedule, material and dimensions of every run. */
export function runPipes(
  graph: SpoolGraph,
  sizes: RunSizes,
  designSpec: ResolvedSpec,
  issues: IssueSink,
  unconfirmed: UnconfirmedSink = unconfirmedSink(),
): Map<string, RunPipe> {
  const out = new Map<string, RunPipe>();
  for (const run of graph.runOrder) {
    const spec = applySpec(designSpec, run.spec);
    const nps = sizes.get(run.id) ?? null;
    let dims = null;
    if (nps) {
      const look = cachedPipeDimensions(nps, spec.schedule);
      if (look.ok) {
        dims = look.value;
        if (dims.status === 'M')
          noteUnconfirmed(unconfirmed, 'M', pipeWhat(nps, spec.schedule, dims), 'ASME B36.10M', run.id);
      } else addError(issues, 'standard-data-missing', look.missing, run.id);
    }
    out.set(run.id, {
      nps,
      schedule: spec.schedule,
      material: spec.material,
      heat: run.heat ?? null,
      dims,
      spec,
    });
  }
  return out;
}

/** Analyses every reachable node. Nodes whose role is invalid get no analysis. */
export function analyseNodes(
  graph: SpoolGraph,
  roles: Map<string, NodeRole>,
  pipes: Map<string, RunPipe>,
  designSpec: ResolvedSpec,
  angleToleranceDeg: number,
  issues: IssueSink,
  unconfirmed: UnconfirmedSink = unconfirmedSink(),
): Map<string, NodeAnalysis> {
  const out = new Map<string, NodeAnalysis>();
  for (const nodeId of graph.nodeOrder) {
    const node = graph.nodes.get(nodeId)!;
    const role = roles.get(nodeId);
    if (!role || role.kind === 'invalid') continue;
    const ctx: NodeContext = {
      node,
      role,
      issues,
      unconfirmed,
      angleToleranceDeg,
      pipe: (runId) => pipes.get(runId)!,
      specAt: (runId) => applySpec(runId ? (pipes.get(runId)?.spec ?? designSpec) : designSpec, node.spec),
    };
    const a = analyseOne(ctx);
    if (a) out.set(nodeId, a);
  }
  return out;
}

function pipeWhat(
  nps: string,
  schedule: Parameters<typeof cachedScheduleLabel>[0],
  d: PipeDimensions,
): string {
  const label = cachedScheduleLabel(schedule);
  return d.wallStatus === 'M'
    ? `NPS ${nps} ${label} pipe wall = ${mmText(d.wallMm)} mm`
    : `NPS ${nps} pipe outside diameter = ${mmText(d.odMm)} mm`;
}

function analyseOne(ctx: NodeContext): NodeAnalysis | null {
  const { node, role } = ctx;
  switch (node.kind) {
    case 'end':
      return role.kind === 'end' ? analyseEnd(ctx, node, role.conn) : null;
    case 'elbow':
      return role.kind === 'bend' ? analyseElbow(ctx, node, role.a, role.b, role.angleDeg) : null;
    case 'return':
      return role.kind === 'return' ? analyseReturn(ctx, node, role.a, role.b) : null;
    case 'tee':
      return role.kind === 'tee' ? analyseTee(ctx, node, role.runA, role.runB, role.branch) : null;
    case 'set-on-branch':
      return role.kind === 'header' && role.branch
        ? analyseSetOn(ctx, node, role.headerA, role.headerB, role.branch, role.branchAngleDeg ?? 90)
        : null;
    case 'half-coupling':
    case 'branch-outlet':
      return role.kind === 'header'
        ? analyseSmallBore(ctx, node, role.headerA, role.headerB, role.branch, role.branchAngleDeg)
        : null;
    case 'reducer':
      return role.kind === 'inline' ? analyseReducer(ctx, node, role.a, role.b) : null;
    case 'socket-fitting':
      return analyseSocketFitting(ctx, node, role);
  }
}
