import { Matrix4, Quaternion, Vector3 } from 'three';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { toVector3 } from './scene-units';

/**
 * Where a torus segment goes so that it runs from bend end `a` to end `b` around the
 * centre of curvature (plant mm in, scene units out). three's torus lies in its local xy
 * plane and starts on +x: the local basis puts +x towards `a` and +y towards the sweep.
 * For a 180° return, `b` is opposite `a` and the sweep side comes from `sweepHint` (the
 * direction from the centre to the middle of the arc) or else the bend-plane normal.
 */
export function bendPose(arcCentre: Vec3, a: Vec3, b: Vec3, planeNormal: Vec3, sweepHint?: Vec3): { position: Vector3; quaternion: Quaternion } {
  const c = toVector3(arcCentre);
  const u = toVector3(a).sub(c).normalize();
  const toB = toVector3(b).sub(c);
  let v = toB.clone().sub(u.clone().multiplyScalar(toB.dot(u)));
  if (v.lengthSq() < 1e-12) v = sweepHint ? toVector3(sweepHint) : toVector3(planeNormal).normalize().cross(u);
  v.normalize();
  const w = new Vector3().crossVectors(u, v);
  return { position: c, quaternion: new Quaternion().setFromRotationMatrix(new Matrix4().makeBasis(u, v, w)) };
}
