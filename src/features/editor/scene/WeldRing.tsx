import { useMemo } from 'react';
import { Quaternion, Vector3 } from 'three';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { mmToScene, toScene, toVector3 } from './scene-units';

const Z_AXIS = new Vector3(0, 0, 1);

/** A weld drawn as a thin bead around the pipe at the weld centre, square to the pipe axis. */
export function WeldRing({ position, axis, odMm, colour }: { position: Vec3; axis: Vec3; odMm: number; colour: string }) {
  const quaternion = useMemo(() => new Quaternion().setFromUnitVectors(Z_AXIS, toVector3(axis).normalize()), [axis]);
  const bead = Math.max(3, odMm * 0.035);
  return (
    <mesh position={toScene(position)} quaternion={quaternion}>
      <torusGeometry args={[mmToScene(odMm / 2 + bead * 0.3), mmToScene(bead), 6, 40]} />
      <meshStandardMaterial color={colour} roughness={0.9} />
    </mesh>
  );
}
