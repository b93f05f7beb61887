/**
 * Overall dimensions: the box of all work points, ports, pipe ends and faces, and the
 * shipping envelope (the same points grown by each part's outside radius; conservative).
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import type { Box, ComponentResult, OverallDimensions, PipePiece } from './compute-result';

/** Grows a box (in place) to hold `p` grown by `r` mm in every axis. */
function grow(box: { min: Vec3; max: Vec3 } | null, p: Vec3, r: number): { min: Vec3; max: Vec3 } {
  if (!box)
    return { min: { x: p.x - r, y: p.y - r, z: p.z - r }, max: { x: p.x + r, y: p.y + r, z: p.z + r } };
  const { min, max } = box;
  if (p.x - r < min.x) min.x = p.x - r;
  if (p.y - r < min.y) min.y = p.y - r;
  if (p.z - r < min.z) min.z = p.z - r;
  if (p.x + r > max.x) max.x = p.x + r;
  if (p.y + r > max.y) max.y = p.y + r;
  if (p.z + r > max.z) max.z = p.z + r;
  return box;
}

function finish(b: { min: Vec3; max: Vec3 }): Box {
  return {
    min: b.min,
    max: b.max,
    sizeMm: { x: b.max.x - b.min.x, y: b.max.y - b.min.y, z: b.max.z - b.min.z },
  };
}

/** Boxes of the placed spool, or null when nothing is placed. */
export function overallDimensions(
  components: ComponentResult[],
  pieces: PipePiece[],
): OverallDimensions | null {
  let wp: { min: Vec3; max: Vec3 } | null = null;
  let env: { min: Vec3; max: Vec3 } | null = null;
  for (const c of components) {
    wp = grow(wp, c.position, 0);
    env = grow(env, c.position, 0);
    for (const e of c.ends) {
      wp = grow(wp, e.point, 0);
      env = grow(env, e.point, (e.odMm ?? 0) / 2);
    }
    if (c.shape.type === 'flange') env = grow(env, c.shape.faceCentre, (c.shape.odMm ?? 0) / 2);
    if (c.shape.type === 'elbow' || c.shape.type === 'return') {
      // The bend's outer arc passes beyond its ends: include the arc midpoint.
      const r = c.shape.bendRadiusMm;
      const centre = c.shape.arcCentre;
      const dx = c.position.x - centre.x;
      const dy = c.position.y - centre.y;
      const dz = c.position.z - centre.z;
      const l = Math.sqrt(dx * dx + dy * dy + dz * dz);
      if (l > 1e-9 && c.shape.type === 'elbow') {
        const mid = { x: centre.x + (dx / l) * r, y: centre.y + (dy / l) * r, z: centre.z + (dz / l) * r };
        env = grow(env, mid, (c.ends[0]?.odMm ?? 0) / 2);
      } else if (c.shape.type === 'return' && c.ends[0]) {
        // A return's back lies opposite its legs.
        const o = c.ends[0].outward;
        env = grow(
          env,
          { x: centre.x - o.x * r, y: centre.y - o.y * r, z: centre.z - o.z * r },
          (c.ends[0].odMm ?? 0) / 2,
        );
      }
    }
  }
  for (const p of pieces) {
    wp = grow(wp, p.start, 0);
    wp = grow(wp, p.end, 0);
    env = grow(env, p.start, (p.odMm ?? 0) / 2);
    env = grow(env, p.end, (p.odMm ?? 0) / 2);
  }
  if (!wp || !env) return null;
  return { workPointBox: finish(wp), envelopeBox: finish(env) };
}
