import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';

/** Small vector helpers over plain plant-coordinate values (x east, y north, z up). */

/** Tolerance for "same direction" comparisons of unit vectors (about 0.06°). */
export const DIRECTION_EPSILON = 1e-6;

export function vecLength(v: Vec3): number {
  return Math.hypot(v.x, v.y, v.z);
}

/** Unit vector along `v`; the zero vector stays zero. */
export function normalise(v: Vec3): Vec3 {
  const len = vecLength(v);
  return len === 0 ? { x: 0, y: 0, z: 0 } : { x: v.x / len, y: v.y / len, z: v.z / len };
}

export function dot(a: Vec3, b: Vec3): number {
  return a.x * b.x + a.y * b.y + a.z * b.z;
}

export function cross(a: Vec3, b: Vec3): Vec3 {
  return { x: a.y * b.z - a.z * b.y, y: a.z * b.x - a.x * b.z, z: a.x * b.y - a.y * b.x };
}

export function add(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x + b.x, y: a.y + b.y, z: a.z + b.z };
}

export function sub(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x - b.x, y: a.y - b.y, z: a.z - b.z };
}

export function scale(v: Vec3, k: number): Vec3 {
  return { x: v.x * k, y: v.y * k, z: v.z * k };
}

export function distance(a: Vec3, b: Vec3): number {
  return vecLength(sub(a, b));
}

/** Angle between two directions, degrees in [0, 180]. */
export function angleBetweenDeg(a: Vec3, b: Vec3): number {
  const c = dot(normalise(a), normalise(b));
  return (Math.acos(Math.min(1, Math.max(-1, c))) * 180) / Math.PI;
}

/** True when the two directions point the same way. */
export function sameDirection(a: Vec3, b: Vec3): boolean {
  return 1 - dot(normalise(a), normalise(b)) < DIRECTION_EPSILON;
}

/** True when the two directions are parallel or antiparallel. */
export function collinear(a: Vec3, b: Vec3): boolean {
  return 1 - Math.abs(dot(normalise(a), normalise(b))) < DIRECTION_EPSILON;
}

/** True when the two directions are at right angles. */
export function perpendicular(a: Vec3, b: Vec3): boolean {
  return Math.abs(dot(normalise(a), normalise(b))) < 1e-6;
}

/** Rounds each component to 1e-9 so that 0.1 + 0.2 style noise does not reach the document. */
export function tidy(v: Vec3): Vec3 {
  const r = (n: number) => (Math.abs(n) < 1e-12 ? 0 : Math.round(n * 1e9) / 1e9);
  return { x: r(v.x), y: r(v.y), z: r(v.z) };
}
