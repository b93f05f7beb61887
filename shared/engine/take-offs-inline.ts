/**
 * Take-offs of in-line components: reducers (ASME B16.9, work point at mid-length on the
 * large end's axis) and socket-weld couplings (ASME B16.11).
 */
import type { SpoolNode } from '../schemas/spool-design-node.schema';
import { nodeRef } from './component-refs';
import { reducerDimensions } from '../standards/butt-weld-fittings';
import { compareNps } from '../standards/nps';
import type { Connection } from './classify-nodes';
import { cachedPipeDimensions, cachedScheduleLabel } from './standards-cache';
import { addError } from './issues';
import { buttEnd } from './node-end-builders';
import type { NodeAnalysis, NodeContext } from './node-analysis';
import { mmText, noteUnconfirmed } from './unconfirmed-data';
import { normalise, rejectFrom, scale, UP, ZERO } from './vec3-math';

type ReducerNode = Extract<SpoolNode, { kind: 'reducer' }>;

/** Analyses a reducer between legs `a` and `b` (collinear). */
export function analyseReducer(
  ctx: NodeContext,
  node: ReducerNode,
  a: Connection,
  b: Connection,
): NodeAnalysis {
  const pa = ctx.pipe(a.run.id);
  const pb = ctx.pipe(b.run.id);
  const spec = ctx.specAt(a.run.id);
  const eccentric = node.type === 'eccentric';
  const fallback: NodeAnalysis = {
    node,
    role: ctx.role,
    nps: pa.nps,
    ends: [
      buttEnd(a, pa.nps, null, spec.rootGapMm),
      buttEnd(b, pb.nps, null, ctx.specAt(b.run.id).rootGapMm),
    ],
    description: `Reducer ${eccentric ? 'eccentric' : 'concentric'}`,
    bom: null,
    source: null,
    internalWelds: [],
    detail: {
      type: 'reducer',
      largeNps: null,
      smallNps: null,
      lengthMm: null,
      eccentric,
      largeEnd: null,
      smallEnd: null,
    },
  };
  if (!pa.nps || !pb.nps) return fallback;
  const cmp = compareNps(pa.nps, pb.nps);
  if (cmp === 0) {
    addError(ctx.issues, 'size-mismatch', `${nodeRef(node.id)} has NPS ${pa.nps} on both ends`, node.id);
    return fallback;
  }
  const [large, small] = cmp > 0 ? [a, b] : [b, a];
  const largeNps = cmp > 0 ? pa.nps : pb.nps;
  const smallNps = cmp > 0 ? pb.nps : pa.nps;
  const look = reducerDimensions(largeNps, smallNps);
  if (!look.ok) addError(ctx.issues, 'standard-data-missing', look.missing, node.id);
  const H = look.ok ? look.value.lengthMm : null;
  if (look.ok && look.value.status === 'M')
    noteUnconfirmed(
      ctx.unconfirmed,
      'M',
      `NPS ${largeNps} reducer length H = ${mmText(look.value.lengthMm)} mm`,
      'ASME B16.9',
      node.id,
    );
  const half = H !== null ? H / 2 : null;

  let smallOffset = ZERO;
  let flat = 'top';
  if (eccentric) {
    const side = node.flatSide ?? 'top';
    flat = typeof side === 'string' ? side : 'as stated';
    const dir = side === 'top' ? UP : side === 'bottom' ? scale(UP, -1) : side;
    const f = normalise(rejectFrom(dir, a.outward));
    const odL = cachedPipeDimensions(largeNps, ctx.pipe(large.run.id).schedule);
    const odS = cachedPipeDimensions(smallNps, ctx.pipe(small.run.id).schedule);
    if (!f) {
      addError(
        ctx.issues,
        'direction-mismatch',
        `${nodeRef(node.id)}: its flat side cannot be "${flat}" on a run along that direction`,
        node.id,
      );
    } else if (odL.ok && odS.ok) {
      // The flat side stays flush, so the small end's axis moves away from it.
      smallOffset = scale(f, -(odL.value.odMm - odS.value.odMm) / 2);
    }
  }
  const sched = cachedScheduleLabel(pa.schedule);
  const kind = eccentric ? `eccentric, flat ${flat}` : 'concentric';
  const largeEnd = buttEnd(large, largeNps, half, ctx.specAt(large.run.id).rootGapMm);
  const smallEnd = {
    ...buttEnd(small, smallNps, half, ctx.specAt(small.run.id).rootGapMm),
    portOffset: smallOffset,
  };
  return {
    node,
    role: ctx.role,
    nps: largeNps,
    ends: large === a ? [largeEnd, smallEnd] : [smallEnd, largeEnd],
    description: `Reducer ${kind}, NPS ${largeNps} × ${smallNps} ${sched}, ASME B16.9`,
    bom: {
      category: 'fitting',
      description: `Reducer ${eccentric ? 'eccentric' : 'concentric'} NPS ${largeNps} × ${smallNps} ${sched}, ${spec.fittingMaterial}, ASME B16.9`,
      nps: largeNps,
    },
    source: look.ok ? look.value.source : null,
    internalWelds: [],
    detail: { type: 'reducer', largeNps, smallNps, lengthMm: H, eccentric, largeEnd: null, smallEnd: null },
  };
}
