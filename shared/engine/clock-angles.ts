/**
 * Angles "around a pipe" as the trade gives them: degrees clockwise, as seen by someone
 * looking along a stated direction, from the plant vertical (or plant north when the view
 * direction is itself vertical). Used for bolt holes and small-bore orientations.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import { cross, dot, normalise, NORTH, rejectFrom, UP } from './vec3-math';

/** Within this angle of vertical a view direction counts as vertical (reference: north), degrees. */
export const VERTICAL_TOLERANCE_DEG = 0.5;
const SIN_VERTICAL = Math.sin((VERTICAL_TOLERANCE_DEG * Math.PI) / 180);

/** The "12 o'clock" reference for a view along unit `viewDir`: the plant vertical, or north. */
export function clockReference(viewDir: Vec3): { up: Vec3; reference: 'plant-vertical' | 'plant-north' } {
  const r = rejectFrom(UP, viewDir);
  const len = Math.sqrt(r.x * r.x + r.y * r.y + r.z * r.z);
  if (len > SIN_VERTICAL)
    return { up: { x: r.x / len, y: r.y / len, z: r.z / len }, reference: 'plant-vertical' };
  return { up: normalise(rejectFrom(NORTH, viewDir)) ?? NORTH, reference: 'plant-north' };
}

/**
 * Clockwise angle, degrees in [0, 360), from `up` to `v` as seen looking along `viewDir`
 * (all unit vectors, `up` and `v` perpendicular to `viewDir`).
 */
export function clockwiseAngleDeg(v: Vec3, viewDir: Vec3, up: Vec3): number {
  const right = cross(viewDir, up);
  const deg = (Math.atan2(dot(v, right), dot(v, up)) * 180) / Math.PI;
  const w = ((deg % 360) + 360) % 360;
  return w >= 360 - 1e-9 ? 0 : w;
}

/** The unit vector at `deg` clockwise from `up`, seen looking along `viewDir`. */
export function directionAtClockwiseDeg(viewDir: Vec3, up: Vec3, deg: number): Vec3 {
  const right = cross(viewDir, up);
  const a = (deg * Math.PI) / 180;
  const c = Math.cos(a);
  const s = Math.sin(a);
  return { x: up.x * c + right.x * s, y: up.y * c + right.y * s, z: up.z * c + right.z * s };
}

/**
 * Direction of a branch leaving a header at `orientationDeg` (clockwise looking along the
 * header's run direction, 0 = top; north if the header is vertical). For editors placing
 * small-bore connections. `headerDirection` need not be unit length.
 */
export function branchDirectionFromOrientation(headerDirection: Vec3, orientationDeg: number): Vec3 {
  const h = normalise(headerDirection) ?? { x: 1, y: 0, z: 0 };
  return directionAtClockwiseDeg(h, clockReference(h).up, orientationDeg);
}

/** Orientation (degrees, see {@link branchDirectionFromOrientation}) of unit `branch` around unit header `h`. */
export function orientationOfBranch(h: Vec3, branch: Vec3): number | null {
  const b = normalise(rejectFrom(branch, h));
  if (!b) return null;
  return clockwiseAngleDeg(b, h, clockReference(h).up);
}
