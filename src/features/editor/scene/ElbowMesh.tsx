import { useMemo } from 'react';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { mmToScene } from './scene-units';
import { bendPose } from './bend-pose';
import type { PickHandler } from './PipeSegment';

/**
 * A bend drawn as a torus segment around its centre of curvature, from end `a` to end
 * `b` (plant mm): elbows at any angle and 180° returns. three's torus lies in its local
 * xy plane starting on +x; the local basis is built so +x points at `a` and the arc
 * sweeps towards `b`.
 */
export function ElbowMesh({
  arcCentre,
  a,
  b,
  bendRadiusMm,
  angleDeg,
  odMm,
  colour,
  onClick,
  planeNormal,
  sweepHint,
}: {
  arcCentre: Vec3;
  a: Vec3;
  b: Vec3;
  bendRadiusMm: number;
  angleDeg: number;
  odMm: number;
  colour: string;
  onClick?: PickHandler;
  planeNormal: Vec3;
  /** For a 180° return: the direction from the centre to the middle of the arc. */
  sweepHint?: Vec3;
}) {
  const pose = useMemo(() => bendPose(arcCentre, a, b, planeNormal, sweepHint), [arcCentre, a, b, planeNormal, sweepHint]);
  const arc = (Math.max(0.5, angleDeg) * Math.PI) / 180;
  return (
    <mesh position={pose.position} quaternion={pose.quaternion} onClick={onClick}>
      <torusGeometry args={[mmToScene(bendRadiusMm), mmToScene(odMm / 2), 14, Math.max(6, Math.round(angleDeg / 7)), arc]} />
      <meshStandardMaterial color={colour} metalness={0.35} roughness={0.5} />
    </mesh>
  );
}
