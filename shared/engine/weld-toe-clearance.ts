/**
 * Clearance between weld toes along a header: a branch connection's weld (set-on branch,
 * half coupling, branch outlet) against the girth welds at the ends of its header pipe and
 * against other branch welds on the same pipe. Weld toes closer than the shop's minimum
 * put one heat-affected zone in another and block inspection: a warning, since whether it
 * is acceptable is the engineer's call.
 *
 * Weld extents (common practice, no source): a butt weld's cap reaches T·tan 37.5° + 1.6 mm
 * past the pipe end (37.5° bevel of ASME B16.25, cap 1.6 mm over each edge); a branch weld's
 * toe lies one branch wall beyond the branch's outside on the header (a half coupling's:
 * one socket wall C, ASME B16.11); a slip-on's hub fillet toe is where the pipe clears the
 * hub and its fillet leg. A branch outlet is taken as wide as its branch pipe: its base is
 * wider (maker's catalogue), so its clearance is overstated.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { socketWeldDimensions } from '../standards/socket-weld-fittings';
import type { WeldResult } from './compute-result';
import type { SpoolGraph } from './build-graph';
import { addWarning, type IssueSink } from './issues';
import type { NodeAnalysis, NodeEnd, RunPipe } from './node-analysis';
import type { PlacedRun } from './place-runs';
import { endFor } from './place-runs';
import { cachedPipeOdMm } from './standards-cache';
import { dot } from './vec3-math';

const BEVEL_TAN = Math.tan((37.5 * Math.PI) / 180);
/** Cap overlap past each bevel edge, mm (common practice, no source). */
const CAP_OVERLAP_MM = 1.6;

type Footprint = { legMm: number; sAlong: (dir: Vec3) => number };

/** How far a branch's weld toe reaches from its work point along unit `dir` of the header, mm. */
function reach(f: Footprint, dir: Vec3): number {
  return f.sAlong(dir) + f.legMm;
}

function footprint(a: NodeAnalysis, pipes: Map<string, RunPipe>): Footprint | null {
  const d = a.detail;
  if (d.type !== 'branch' || !d.branchAxis) return null;
  const headerRun = a.ends.find((e) => e.pipeContinues)?.conn.run.id;
  const header = headerRun ? pipes.get(headerRun)?.dims : null;
  if (!header) return null;
  const b = d.branchAxis;
  let od: number | null;
  let leg: number;
  const brEnd = a.ends.find((e) => !e.pipeContinues);
  const brPipe = brEnd ? pipes.get(brEnd.conn.run.id) : undefined;
  if (a.node.kind === 'half-coupling') {
    const sw = d.branchNps ? socketWeldDimensions(d.branchNps, 'half-coupling') : null;
    if (!sw?.ok) return null;
    od = sw.value.socketBoreMm + 2 * sw.value.socketWallMm;
    leg = sw.value.socketWallMm;
  } else {
    od = brPipe?.dims?.odMm ?? (d.branchNps ? cachedPipeOdMm(d.branchNps) : null);
    leg = brPipe?.dims?.wallMm ?? 0;
  }
  if (od === null) return null;
  const R = header.odMm / 2;
  return {
    // The branch's outside meets the header surface ±r/sin α about the point where its
    // axis crosses the surface, R·cot α along the header from the work point.
    legMm: leg,
    sAlong: (dir) => {
      const s = dot(b, dir);
      const sin = Math.sqrt(Math.max(1e-6, 1 - s * s));
      return (R * s) / sin + od / 2 / sin;
    },
  };
}

/** Where, from a pipe end, the toe of the weld at `end` lies back along the pipe, mm. */
function toeFromPipeEnd(end: NodeEnd, pipe: RunPipe): number | null {
  const wall = pipe.dims?.wallMm;
  if (wall === undefined) return null;
  switch (end.joint) {
    case 'butt':
      return wall * BEVEL_TAN + CAP_OVERLAP_MM;
    case 'open':
      return end.prep === 'weld-bevel' ? wall * BEVEL_TAN + CAP_OVERLAP_MM : null;
    case 'slip-on':
      return end.pipeNeeded ? end.pipeNeeded.mm : null;
    default:
      return null;
  }
}

/** Warns where a branch weld's toe comes within the shop's minimum of another weld's toe. */
export function checkWeldToeClearance(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  placed: Map<string, PlacedRun>,
  pipes: Map<string, RunPipe>,
  welds: WeldResult[],
  issues: IssueSink,
): void {
  const branchWeld = (nodeId: string) => welds.find((w) => w.nodeId === nodeId && w.type === 'branch');
  const reported = new Set<string>();
  for (const nodeId of graph.nodeOrder) {
    const a = analyses.get(nodeId);
    if (!a || a.detail.type !== 'branch') continue;
    const fp = footprint(a, pipes);
    const mine = branchWeld(nodeId);
    if (!fp || !mine) continue;
    for (const start of a.ends.filter((e) => e.pipeContinues)) {
      const dir = start.conn.outward;
      let run = start.conn.run;
      let at = nodeId;
      let dist = 0;
      // Walk along the header pipe until it ends (at most one pipe: it stops at a weld).
      for (let step = 0; step < 64; step++) {
        const p = placed.get(run.id);
        const pipe = pipes.get(run.id);
        if (!p || !pipe) break;
        const other = run.from === at ? run.to : run.from;
        const oa = analyses.get(other);
        const otherEnd = endFor(oa, run.id);
        if (!oa || !otherEnd) break;
        const limit = pipe.spec.minWeldToeClearanceMm;
        if (otherEnd.pipeContinues) {
          dist += p.workPointDistanceMm;
          const ofp = footprint(oa, pipes);
          const theirs = branchWeld(other);
          const key = [nodeId, other].sort().join('|');
          if (ofp && theirs && !reported.has(key)) {
            reported.add(key);
            const gap = dist - reach(fp, dir) - reach(ofp, { x: -dir.x, y: -dir.y, z: -dir.z });
            warnIfClose(issues, gap, limit, mine, theirs, nodeId);
          }
          const next = oa.ends.find((e) => e.pipeContinues && e.conn.run.id !== run.id);
          if (!next) break;
          at = other;
          run = next.conn.run;
          continue;
        }
        const toe = toeFromPipeEnd(otherEnd, pipe);
        const girth = welds.find((w) => w.nodeId === other && w.runId === run.id);
        if (toe !== null && girth && otherEnd.takeOffMm !== null) {
          const pipeEnd = dist + p.workPointDistanceMm - otherEnd.takeOffMm - otherEnd.gapMm;
          const gap = pipeEnd - toe - reach(fp, dir);
          warnIfClose(issues, gap, limit, mine, girth, nodeId);
        }
        break;
      }
    }
  }
}

function warnIfClose(
  issues: IssueSink,
  gapMm: number,
  limitMm: number,
  branch: WeldResult,
  other: WeldResult,
  nodeId: string,
): void {
  if (gapMm >= limitMm) return;
  const what = other.type === 'branch' ? 'branch weld' : 'weld';
  const text =
    gapMm <= 0
      ? `overlap by ${r(-gapMm)} mm`
      : `are ${r(gapMm)} mm apart, under the shop's ${r(limitMm)} mm minimum`;
  addWarning(
    issues,
    'weld-toes-close',
    `The toes of branch weld ${branch.mark} (NPS ${branch.nps}) and ${what} ${other.mark} (NPS ${other.nps}) ${text}: move the branch or the joint, or have the engineer accept it`,
    nodeId,
  );
}

function r(x: number): number {
  return Math.round(x * 10) / 10;
}
