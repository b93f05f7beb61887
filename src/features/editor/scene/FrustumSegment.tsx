import { useMemo } from 'react';
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
  if (!pose) return null;
  // The geometry's top (+y) is the `to` end after the rotation onto from→to. As a JSX child
  // it is disposed by react-three-fiber when it changes or unmounts.
  return (
    <mesh position={pose.position} quaternion={pose.quaternion} onClick={onClick}>
      <cylinderGeometry args={[mmToScene(toOdMm / 2), mmToScene(fromOdMm / 2), pose.length, 32]} />
      <meshStandardMaterial color={colour} metalness={0.35} roughness={0.55} />
    </mesh>
  );
}
