import { Quaternion, Vector3 } from 'three';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';

/**
 * The scene edge: the engine speaks millimetres in plant axes (x east, y north, z up);
 * the scene uses metres on the same axes (the camera's up is +z). Nothing inside the
 * scene converts units anywhere else.
 */
export const SCENE_UNITS_PER_MM = 0.001;

/** A plant point (mm) as a scene position tuple (m). */
export function toScene(v: Vec3): [number, number, number] {
  return [v.x * SCENE_UNITS_PER_MM, v.y * SCENE_UNITS_PER_MM, v.z * SCENE_UNITS_PER_MM];
}

/** A plant point (mm) as a new three.js vector (m). */
export function toVector3(v: Vec3): Vector3 {
  return new Vector3(v.x * SCENE_UNITS_PER_MM, v.y * SCENE_UNITS_PER_MM, v.z * SCENE_UNITS_PER_MM);
}

/** A length in mm as scene units. */
export function mmToScene(mm: number): number {
  return mm * SCENE_UNITS_PER_MM;
}

const Y_AXIS = new Vector3(0, 1, 0);

/** The rotation that turns the +y axis (three's cylinder axis) onto `direction`. */
export function quaternionFromY(direction: Vector3): Quaternion {
  return new Quaternion().setFromUnitVectors(Y_AXIS, direction.clone().normalize());
}

/** Midpoint, length and rotation of a segment between two scene points, for a unit cylinder. */
export function segmentPose(a: Vector3, b: Vector3): { position: Vector3; length: number; quaternion: Quaternion } | null {
  const d = b.clone().sub(a);
  const length = d.length();
  if (length < 1e-9) return null;
  return { position: a.clone().add(b).multiplyScalar(0.5), length, quaternion: quaternionFromY(d) };
}
