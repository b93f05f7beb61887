import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';

/** Small 3D helpers for the drawing; plant coordinates, mm. */
export const add = (a: Vec3, b: Vec3): Vec3 => ({ x: a.x + b.x, y: a.y + b.y, z: a.z + b.z });
export const sub = (a: Vec3, b: Vec3): Vec3 => ({ x: a.x - b.x, y: a.y - b.y, z: a.z - b.z });
export const scale = (a: Vec3, k: number): Vec3 => ({ x: a.x * k, y: a.y * k, z: a.z * k });
export const dot = (a: Vec3, b: Vec3): number => a.x * b.x + a.y * b.y + a.z * b.z;
export const cross = (a: Vec3, b: Vec3): Vec3 => ({
  x: a.y * b.z - a.z * b.y,
  y: a.z * b.x - a.x * b.z,
  z: a.x * b.y - a.y * b.x,
});
export const length = (a: Vec3): number => Math.hypot(a.x, a.y, a.z);
export const distance = (a: Vec3, b: Vec3): number => length(sub(a, b));
export const normalise = (a: Vec3): Vec3 => {
  const l = length(a);
  return l > 1e-12 ? scale(a, 1 / l) : { x: 0, y: 0, z: 0 };
};
export const lerp = (a: Vec3, b: Vec3, t: number): Vec3 => add(a, scale(sub(b, a), t));

/** Rotates `v` about unit axis `k` by `angle` radians (Rodrigues' formula). */
export function rotateAbout(v: Vec3, k: Vec3, angle: number): Vec3 {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  return add(add(scale(v, c), scale(cross(k, v), s)), scale(k, dot(k, v) * (1 - c)));
}

/**
 * Points along a circular arc from `from` to `to` about `centre`, turning about `normal`
 * (either sense: the one that lands on `to` is used; for a half turn `through` picks the side).
 */
export function arcPoints(
  centre: Vec3,
  from: Vec3,
  to: Vec3,
  normal: Vec3,
  segments: number,
  through?: Vec3,
): Vec3[] {
  const a = sub(from, centre);
  const b = sub(to, centre);
  const n = normalise(normal);
  const cos = dot(normalise(a), normalise(b));
  const angle = Math.acos(Math.max(-1, Math.min(1, cos)));
  let sense: number;
  if (through) {
    const mid = add(centre, rotateAbout(a, n, angle / 2));
    const midOther = add(centre, rotateAbout(a, n, -angle / 2));
    sense = distance(mid, through) <= distance(midOther, through) ? 1 : -1;
  } else {
    sense = distance(rotateAbout(a, n, angle), b) <= distance(rotateAbout(a, n, -angle), b) ? 1 : -1;
  }
  const points: Vec3[] = [];
  for (let i = 0; i <= segments; i += 1)
    points.push(add(centre, rotateAbout(a, n, (sense * angle * i) / segments)));
  return points;
}

/** A plant axis perpendicular to `d` (up, then east, then north), for drawing ticks and offsets. */
export function perpendicularAxis(
  d: Vec3,
  prefer: Vec3[] = [
    { x: 0, y: 0, z: 1 },
    { x: 1, y: 0, z: 0 },
    { x: 0, y: 1, z: 0 },
  ],
): Vec3 {
  const u = normalise(d);
  for (const axis of prefer)
    if (Math.abs(dot(axis, u)) < 0.2) return normalise(sub(axis, scale(u, dot(axis, u))));
  return normalise(cross(u, { x: 0, y: 0, z: 1 }));
}
