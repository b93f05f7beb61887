import { useMemo } from 'react';
import { CylinderGeometry } from 'three';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { mmToScene, segmentPose, toVector3 } from './scene-units';
import type { PickHandler } from './PipeSegment';

/** A cone frustum from `from` (diameter `fromOdMm`) to `to` (diameter `toOdMm`): reducers, flange hubs. */
export function FrustumSegment({
  from,
  to,
  fromOdMm,
  toOdMm,
  colour,
  onClick,
}: {
  from: Vec3;
  to: Vec3;
  fromOdMm: number;
  toOdMm: number;
  colour: string;
  onClick?: PickHandler;
}) {
  const pose = useMemo(() => segmentPose(toVector3(from), toVector3(to)), [from, to]);
  // CylinderGeometry's top is +y: the `to` end after the rotation onto from→to.
  const geometry = useMemo(
    () => (pose ? new CylinderGeometry(mmToScene(toOdMm / 2), mmToScene(fromOdMm / 2), pose.length, 32) : null),
    [pose, fromOdMm, toOdMm],
  );
  if (!pose || !geometry) return null;
  return (
    <mesh geometry={geometry} position={pose.position} quaternion={pose.quaternion} onClick={onClick}>
      <meshStandardMaterial color={colour} metalness={0.35} roughness={0.55} />
    </mesh>
  );
}
