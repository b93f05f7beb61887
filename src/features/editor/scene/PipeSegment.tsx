import { useMemo } from 'react';
import type { ThreeEvent } from '@react-three/fiber';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { mmToScene, segmentPose, toVector3 } from './scene-units';
import { UNIT_CYLINDER } from './shared-geometries';

/** A pointer handler that ignores the click ending an orbit drag. */
export type PickHandler = (event: ThreeEvent<MouseEvent>) => void;

/** Pixels a pointer may move between down and up and still count as a click. */
const CLICK_SLOP_PX = 5;

/** Wraps a click handler so a drag (orbiting) does not select, and the nearest mesh wins. */
export function pickHandler(onPick: (event: ThreeEvent<MouseEvent>) => void): PickHandler {
  return (event) => {
    if (event.delta > CLICK_SLOP_PX) return;
    event.stopPropagation();
    onPick(event);
  };
}

/** A straight cylinder of `odMm` between two plant points (mm), e.g. a pipe piece or a fitting leg. */
export function PipeSegment({
  from,
  to,
  odMm,
  colour,
  onClick,
  name,
}: {
  from: Vec3;
  to: Vec3;
  odMm: number;
  colour: string;
  onClick?: PickHandler;
  name?: string;
}) {
  const pose = useMemo(() => segmentPose(toVector3(from), toVector3(to)), [from, to]);
  if (!pose) return null;
  const r = mmToScene(odMm / 2);
  return (
    <mesh
      name={name}
      geometry={UNIT_CYLINDER}
      position={pose.position}
      quaternion={pose.quaternion}
      scale={[r, pose.length, r]}
      onClick={onClick}
    >
      <meshStandardMaterial color={colour} metalness={0.35} roughness={0.55} />
    </mesh>
  );
}
