/**
 * 3 × 3 rotation matrices (row-major, 9 numbers) for carrying directions through a chain
 * of bends without walking the chain again for every pair of flanges.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { cross, dot, length } from './vec3-math';

/** A row-major 3 × 3 matrix. */
export type Mat3 = readonly [number, number, number, number, number, number, number, number, number];

/** The identity rotation. */
export const IDENTITY: Mat3 = [1, 0, 0, 0, 1, 0, 0, 0, 1];

/** Rotation about unit `k` by `angle` radians (right-hand rule). */
export function axisAngle(k: Vec3, angle: number): Mat3 {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const t = 1 - c;
  const { x, y, z } = k;
  return [
    t * x * x + c,
    t * x * y - s * z,
    t * x * z + s * y,
    t * x * y + s * z,
    t * y * y + c,
    t * y * z - s * x,
    t * x * z - s * y,
    t * y * z + s * x,
    t * z * z + c,
  ];
}

/** The smallest rotation taking unit `u` onto unit `v`; for opposite vectors, 180° about unit `fallback`. */
export function rotationBetween(u: Vec3, v: Vec3, fallback: Vec3): Mat3 {
  const axis = cross(u, v);
  const s = length(axis);
  const c = dot(u, v);
  if (s < 1e-12) return c > 0 ? IDENTITY : axisAngle(fallback, Math.PI);
  return axisAngle({ x: axis.x / s, y: axis.y / s, z: axis.z / s }, Math.atan2(s, c));
}

/** a · b. */
export function multiply(a: Mat3, b: Mat3): Mat3 {
  const o: number[] = new Array(9);
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++)
      o[i * 3 + j] = a[i * 3]! * b[j]! + a[i * 3 + 1]! * b[3 + j]! + a[i * 3 + 2]! * b[6 + j]!;
  }
  return o as unknown as Mat3;
}

/** m · v. */
export function apply(m: Mat3, v: Vec3): Vec3 {
  return {
    x: m[0] * v.x + m[1] * v.y + m[2] * v.z,
    y: m[3] * v.x + m[4] * v.y + m[5] * v.z,
    z: m[6] * v.x + m[7] * v.y + m[8] * v.z,
  };
}

/** mᵀ · v (the inverse rotation applied). */
export function applyTransposed(m: Mat3, v: Vec3): Vec3 {
  return {
    x: m[0] * v.x + m[3] * v.y + m[6] * v.z,
    y: m[1] * v.x + m[4] * v.y + m[7] * v.z,
    z: m[2] * v.x + m[5] * v.y + m[8] * v.z,
  };
}
