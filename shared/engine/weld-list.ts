/**
 * The weld map: every joint numbered W1, W2… in tree order, with type, size, shop or
 * field, and position. Diameter-inches = sum of the nominal sizes of all welds
 * (common practice for estimating and progress).
 */
import { npsInches } from '../standards/nps';
import { nodeRef } from './component-refs';
import type { WeldResult, WeldType } from './compute-result';
import type { SpoolGraph } from './build-graph';
import type { NodeAnalysis, NodeEnd } from './node-analysis';
import type { PlacedRun } from './place-runs';
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { addScaled } from './vec3-math';
import { weldMark } from './mark-text';

/** Builds the weld list and the diameter-inch total. */
export function buildWeldList(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  placed: Map<string, PlacedRun>,
  positions: Map<string, Vec3>,
  pieceMarks: Map<string, string>,
): { welds: WeldResult[]; diameterInches: number } {
  const welds: WeldResult[] = [];
  const push = (w: Omit<WeldResult, 'mark' | 'diameterInches'>) => {
    welds.push({
      mark: weldMark(welds.length + 1),
      type: w.type,
      nps: w.nps,
      diameterInches: npsInches(w.nps),
      location: w.location,
      position: w.position,
      nodeId: w.nodeId,
      runId: w.runId,
      joins: w.joins,
    });
  };
  const name = (nodeId: string) => {
    const n = graph.nodes.get(nodeId);
    if (!n) return 'a node';
    return nodeRef(nodeId);
  };
  const internals = (nodeId: string) => {
    const a = analyses.get(nodeId);
    const at = positions.get(nodeId);
    if (!a || !at) return;
    for (const w of a.internalWelds) {
      for (let i = 0; i < w.count; i++)
        push({
          type: w.type,
          nps: w.nps,
          location: 'shop',
          position: at,
          nodeId,
          runId: null,
          joins: w.joins,
        });
    }
  };
  const atEnd = (p: PlacedRun, atFrom: boolean) => {
    const end: NodeEnd | null = atFrom ? p.fromEnd : p.toEnd;
    const nodeId = atFrom ? p.run.from : p.run.to;
    const a = analyses.get(nodeId);
    if (!end || !a) return;
    const nps = end.nps ?? a.nps;
    if (!nps) return;
    const port = atFrom ? p.start : p.end;
    const along = atFrom ? p.direction : { x: -p.direction.x, y: -p.direction.y, z: -p.direction.z };
    const gap = atFrom ? p.gapFromMm : p.gapToMm;
    const position = addScaled(port, along, (end.takeOffMm ?? 0) + gap / 2);
    const piece = pieceMarks.get(p.run.id) ?? 'pipe';
    if (a.detail.type === 'open-end') {
      if (a.detail.fieldWeld)
        push({
          type: 'butt',
          nps,
          location: 'field',
          position,
          nodeId,
          runId: p.run.id,
          joins: `${piece} to the line (field)`,
        });
      return;
    }
    if (!end.weldType) return;
    for (let i = 0; i < end.weldCount; i++) {
      const which = end.weldType === 'slip-on-fillet' ? (i === 0 ? ' (hub fillet)' : ' (bore fillet)') : '';
      push({
        type: end.weldType,
        nps,
        location: 'shop',
        position,
        nodeId,
        runId: p.run.id,
        joins: `${piece} to ${name(nodeId)}${which}`,
      });
    }
  };

  if (graph.rootId) internals(graph.rootId);
  for (const run of graph.runOrder) {
    const p = placed.get(run.id);
    if (!p) continue;
    if (p.closeCoupled) {
      const fa = analyses.get(run.from);
      const ta = analyses.get(run.to);
      const open = (a: NodeAnalysis | undefined) => a?.detail.type === 'open-end';
      if (fa && ta && p.fromEnd && p.toEnd && !open(fa) && !open(ta)) {
        const nps = p.fromEnd.nps ?? fa.nps;
        const type: WeldType =
          p.fromEnd.weldType === 'flange' || p.toEnd.weldType === 'flange' ? 'flange' : 'butt';
        const position = addScaled(p.start, p.direction, (p.takeOffFromMm ?? 0) + p.gapFromMm);
        if (nps)
          push({
            type,
            nps,
            location: 'shop',
            position,
            nodeId: run.from,
            runId: run.id,
            joins: `${name(run.from)} to ${name(run.to)} (no pipe)`,
          });
      } else {
        // A fitting's own weld end is the spool's open end: only a field weld, if any.
        for (const [a, end, nodeId, at, other] of [
          [ta, p.toEnd, run.to, p.end, run.from],
          [fa, p.fromEnd, run.from, p.start, run.to],
        ] as const) {
          if (a?.detail.type === 'open-end' && a.detail.fieldWeld && end?.nps) {
            push({
              type: 'butt',
              nps: end.nps,
              location: 'field',
              position: at,
              nodeId,
              runId: run.id,
              joins: `${name(other)} to the line (field)`,
            });
          }
        }
      }
    } else {
      atEnd(p, true);
      atEnd(p, false);
    }
    internals(run.to);
  }
  const diameterInches = Math.round(welds.reduce((s, w) => s + w.diameterInches, 0) * 1000) / 1000;
  return { welds, diameterInches };
}
