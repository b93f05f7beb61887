/**
 * Small vector helpers over plain `{x, y, z}` values (plant coordinates, mm or unitless
 * for directions). Pure; every function returns a new value.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';

/** The zero vector. */
export const ZERO: Vec3 = Object.freeze({ x: 0, y: 0, z: 0 });
/** Plant vertical (up). */
export const UP: Vec3 = Object.freeze({ x: 0, y: 0, z: 1 });
/** Plant north. */
export const NORTH: Vec3 = Object.freeze({ x: 0, y: 1, z: 0 });

/** a + b. */
export function add(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x + b.x, y: a.y + b.y, z: a.z + b.z };
}
/** a − b. */
export function sub(a: Vec3, b: Vec3): Vec3 {
  return { x: a.x - b.x, y: a.y - b.y, z: a.z - b.z };
}
/** a · s. */
export function scale(a: Vec3, s: number): Vec3 {
  return { x: a.x * s, y: a.y * s, z: a.z * s };
}
/** a + b · s (a point moved along a direction). */
export function addScaled(a: Vec3, b: Vec3, s: number): Vec3 {
  return { x: a.x + b.x * s, y: a.y + b.y * s, z: a.z + b.z * s };
}
/** Dot product. */
export function dot(a: Vec3, b: Vec3): number {
  return a.x * b.x + a.y * b.y + a.z * b.z;
}
/** Cross product a × b (right-handed). */
export function cross(a: Vec3, b: Vec3): Vec3 {
  return { x: a.y * b.z - a.z * b.y, y: a.z * b.x - a.x * b.z, z: a.x * b.y - a.y * b.x };
}
/** Euclidean length. */
export function length(a: Vec3): number {
  // Not Math.hypot: it is several times slower, and these values never overflow.
  return Math.sqrt(a.x * a.x + a.y * a.y + a.z * a.z);
}
/** Distance between two points. */
export function distance(a: Vec3, b: Vec3): number {
  const dx = a.x - b.x;
  const dy = a.y - b.y;
  const dz = a.z - b.z;
  return Math.sqrt(dx * dx + dy * dy + dz * dz);
}
/** Unit vector along `a`; null for a (near-)zero vector. */
export function normalise(a: Vec3): Vec3 | null {
  const l = length(a);
  return l > 1e-12 && Number.isFinite(l) ? { x: a.x / l, y: a.y / l, z: a.z / l } : null;
}
/** −a. */
export function negate(a: Vec3): Vec3 {
  return { x: -a.x, y: -a.y, z: -a.z };
}
/** Angle between two unit vectors, degrees in [0, 180]. */
export function angleBetweenDeg(a: Vec3, b: Vec3): number {
  // atan2 of |a×b| and a·b stays accurate near 0° and 180°, where acos does not.
  return (Math.atan2(length(cross(a, b)), dot(a, b)) * 180) / Math.PI;
}
/** Component of `a` perpendicular to unit vector `axis`. */
export function rejectFrom(a: Vec3, axis: Vec3): Vec3 {
  return addScaled(a, axis, -dot(a, axis));
}
/** Rotates `v` about unit `axis` by `angleRad` (right-hand rule, Rodrigues). */
export function rotateAbout(v: Vec3, axis: Vec3, angleRad: number): Vec3 {
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  const k = axis;
  const kxv = cross(k, v);
  const kdv = dot(k, v);
  return {
    x: v.x * c + kxv.x * s + k.x * kdv * (1 - c),
    y: v.y * c + kxv.y * s + k.y * kdv * (1 - c),
    z: v.z * c + kxv.z * s + k.z * kdv * (1 - c),
  };
}
/** Some unit vector perpendicular to unit `a`. */
export function anyPerpendicular(a: Vec3): Vec3 {
  const helper = Math.abs(a.z) < 0.9 ? UP : { x: 1, y: 0, z: 0 };
  return normalise(cross(a, helper)) ?? { x: 1, y: 0, z: 0 };
}
/**
 * Rotates `v` by the smallest rotation that takes unit `from` onto unit `to` (parallel
 * transport through a bend). For opposite vectors the rotation axis is `fallbackAxis`.
 */
export function transportAcross(v: Vec3, from: Vec3, to: Vec3, fallbackAxis: Vec3): Vec3 {
  const axis = cross(from, to);
  const s = length(axis);
  const c = dot(from, to);
  if (s < 1e-12) return c > 0 ? v : rotateAbout(v, fallbackAxis, Math.PI);
  return rotateAbout(v, scale(axis, 1 / s), Math.atan2(s, c));
}
/** Rounds each coordinate to `decimals` places (for stable output). */
export function roundVec(a: Vec3, decimals = 3): Vec3 {
  const f = 10 ** decimals;
  return {
    x: Math.round(a.x * f) / f || 0,
    y: Math.round(a.y * f) / f || 0,
    z: Math.round(a.z * f) / f || 0,
  };
}
/** True when every coordinate is a finite number. */
export function isFiniteVec(a: Vec3): boolean {
  return Number.isFinite(a.x) && Number.isFinite(a.y) && Number.isFinite(a.z);
}
