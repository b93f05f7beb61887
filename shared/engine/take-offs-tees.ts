/**
 * Take-offs of tees: butt-weld straight and reducing tees (ASME B16.9: run C, outlet M)
 * and socket-weld tees (ASME B16.11: centre to socket bottom plus the expansion gap).
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { nodeRef } from './component-refs';
import { teeDimensions } from '../standards/butt-weld-fittings';
import type { Connection } from './classify-nodes';
import { cachedScheduleLabel } from './standards-cache';
import { addError } from './issues';
import { buttEnd } from './node-end-builders';
import type { NodeAnalysis, NodeContext } from './node-analysis';
import { mmText, noteUnconfirmed } from './unconfirmed-data';

type TeeNode = Extract<SpoolNode, { kind: 'tee' }>;

/** Analyses a butt-weld tee with run legs `runA`, `runB` and `branch`. */
export function analyseTee(
  ctx: NodeContext,
  node: TeeNode,
  runA: Connection,
  runB: Connection,
  branch: Connection,
): NodeAnalysis {
  const pa = ctx.pipe(runA.run.id);
  const pb = ctx.pipe(runB.run.id);
  const pBr = ctx.pipe(branch.run.id);
  const runNps = pa.nps ?? pb.nps;
  const branchNps = node.branchNps ?? pBr.nps ?? runNps;
  const spec = ctx.specAt(runA.run.id);
  if (pa.nps && pb.nps && pa.nps !== pb.nps) {
    addError(
      ctx.issues,
      'size-mismatch',
      `${nodeRef(node.id)}: its run ends are NPS ${pa.nps} and NPS ${pb.nps}; a tee's run is one size`,
      node.id,
    );
  }
  const look = runNps && branchNps ? teeDimensions(runNps, branchNps) : null;
  if (look && !look.ok) addError(ctx.issues, 'standard-data-missing', look.missing, node.id);
  const C = look?.ok ? look.value.runCentreToEndMm : null;
  const M = look?.ok ? look.value.branchCentreToEndMm : null;
  if (look?.ok && look.value.status === 'M') {
    const size = runNps === branchNps ? `NPS ${runNps} tee` : `NPS ${runNps} × ${branchNps} reducing tee`;
    noteUnconfirmed(
      ctx.unconfirmed,
      look.value.status,
      `${size} C = ${mmText(look.value.runCentreToEndMm)} mm, M = ${mmText(look.value.branchCentreToEndMm)} mm`,
      'ASME B16.9',
      node.id,
    );
  }
  const sched = cachedScheduleLabel(pa.schedule);
  const size = runNps === branchNps ? `NPS ${runNps ?? '?'}` : `NPS ${runNps} × ${branchNps}`;
  const kind = runNps === branchNps ? 'equal' : 'reducing';
  return {
    node,
    role: ctx.role,
    nps: runNps,
    ends: [
      buttEnd(runA, pa.nps, C, ctx.specAt(runA.run.id).rootGapMm),
      buttEnd(runB, pb.nps, C, ctx.specAt(runB.run.id).rootGapMm),
      buttEnd(branch, pBr.nps, M, ctx.specAt(branch.run.id).rootGapMm),
    ],
    description: `Tee ${kind}, ${size} ${sched}, ASME B16.9`,
    bom: runNps
      ? {
          category: 'fitting',
          description: `Tee ${kind} ${size} ${sched}, ${spec.fittingMaterial}, ASME B16.9`,
          nps: runNps,
        }
      : null,
    source: look?.ok ? look.value.source : null,
    internalWelds: [],
    detail: { type: 'tee', branchNps, runCentreToEndMm: C, branchCentreToEndMm: M },
  };
}
