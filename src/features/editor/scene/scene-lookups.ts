import type { FlangeOrientation, SpoolResult } from '../../../../shared/engine/compute-result';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';

/** Worst issue severity per component id (node or run). */
export function severityById(result: SpoolResult): Map<string, 'error' | 'warning'> {
  const map = new Map<string, 'error' | 'warning'>();
  for (const issue of result.issues) {
    if (!issue.componentId) continue;
    if (issue.severity === 'error' || !map.has(issue.componentId)) map.set(issue.componentId, issue.severity);
  }
  return map;
}

/** Flange orientation per flange node id. */
export function flangesById(result: SpoolResult): Map<string, FlangeOrientation> {
  return new Map(result.flanges.map((f) => [f.nodeId, f]));
}

/** Of the runs a pipe piece lies in, the one nearest to a picked point (plant mm). */
export function nearestRun(result: SpoolResult, runIds: string[], point: Vec3): string | undefined {
  let best: string | undefined;
  let bestD = Infinity;
  for (const id of runIds) {
    const run = result.runs.find((r) => r.runId === id);
    if (!run) continue;
    const d = distanceToSegment(point, run.start, run.end);
    if (d < bestD) {
      bestD = d;
      best = id;
    }
  }
  return best ?? runIds[0];
}

function distanceToSegment(p: Vec3, a: Vec3, b: Vec3): number {
  const ab = { x: b.x - a.x, y: b.y - a.y, z: b.z - a.z };
  const ap = { x: p.x - a.x, y: p.y - a.y, z: p.z - a.z };
  const len2 = ab.x * ab.x + ab.y * ab.y + ab.z * ab.z;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, (ap.x * ab.x + ap.y * ab.y + ap.z * ab.z) / len2));
  return Math.hypot(ap.x - ab.x * t, ap.y - ab.y * t, ap.z - ab.z * t);
}

/** Largest pipe OD in the result, mm (for marker sizes); 100 when unknown. */
export function largestOd(result: SpoolResult): number {
  let od = 0;
  for (const p of result.pieces) if (p.odMm && p.odMm > od) od = p.odMm;
  for (const c of result.components) for (const e of c.ends) if (e.odMm && e.odMm > od) od = e.odMm;
  return od || 100;
}
