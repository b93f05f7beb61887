import { useMemo } from 'react';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { SCENE_COLOURS } from './scene-palette';
import { PipeSegment, type PickHandler } from './PipeSegment';
import { FrustumSegment } from './FrustumSegment';
import { UNIT_CYLINDER_LOW } from './shared-geometries';
import { mmToScene, quaternionFromY, toVector3 } from './scene-units';

/** Plant-mm helpers for the flange's own points. */
function along(p: Vec3, dir: Vec3, mm: number): Vec3 {
  return { x: p.x + dir.x * mm, y: p.y + dir.y * mm, z: p.z + dir.z * mm };
}

/**
 * A flange: the disc with its bolt holes where the engine says the first hole is, and
 * (weld neck) the hub tapering to the pipe. The holes show what a fitter lines up, so
 * they are drawn at their true rotation, not spaced from an arbitrary start.
 */
export function FlangeMesh({
  faceCentre,
  outward,
  odMm,
  thicknessMm,
  hubLengthMm,
  pipeOdMm,
  boltCircleMm,
  boltCount,
  firstHoleDirection,
  blind,
  colour,
  onClick,
}: {
  faceCentre: Vec3;
  outward: Vec3;
  odMm: number;
  thicknessMm: number;
  hubLengthMm: number | null;
  pipeOdMm: number;
  boltCircleMm: number | null;
  boltCount: number | null;
  firstHoleDirection: Vec3 | null;
  blind: boolean;
  colour: string;
  onClick?: PickHandler;
}) {
  const back = along(faceCentre, outward, -thicknessMm);
  const holes = useMemo(() => {
    if (!boltCircleMm || !boltCount || !firstHoleDirection) return [];
    const axis = toVector3(outward).normalize();
    const first = toVector3(firstHoleDirection).normalize();
    const centre = toVector3(along(faceCentre, outward, -thicknessMm / 2));
    const q = quaternionFromY(axis);
    return Array.from({ length: boltCount }, (_, k) => {
      const dir = first.clone().applyAxisAngle(axis, (2 * Math.PI * k) / boltCount);
      return { key: k, position: centre.clone().add(dir.multiplyScalar(mmToScene(boltCircleMm / 2))), quaternion: q, first: k === 0 };
    });
  }, [boltCircleMm, boltCount, firstHoleDirection, outward, faceCentre, thicknessMm]);
  // Hole size is not in the result; about a third of the ring between bolt circle and rim reads right.
  const holeR = boltCircleMm ? mmToScene(Math.max(6, ((odMm - boltCircleMm) / 2) * 0.55)) : 0;
  const holeLen = mmToScene(thicknessMm * 1.08);
  return (
    <group>
      <PipeSegment from={back} to={faceCentre} odMm={odMm} colour={colour} onClick={onClick} />
      {blind ? <PipeSegment from={faceCentre} to={along(faceCentre, outward, thicknessMm * 0.8)} odMm={odMm} colour={colour} onClick={onClick} /> : null}
      {hubLengthMm && hubLengthMm > thicknessMm ? (
        <FrustumSegment
          from={back}
          to={along(faceCentre, outward, -hubLengthMm)}
          fromOdMm={Math.min(odMm * 0.8, pipeOdMm * 1.3 + 12)}
          toOdMm={pipeOdMm}
          colour={colour}
          onClick={onClick}
        />
      ) : null}
      {holes.map((h) => (
        <mesh key={h.key} geometry={UNIT_CYLINDER_LOW} position={h.position} quaternion={h.quaternion} scale={[holeR, holeLen, holeR]}>
          <meshBasicMaterial color={h.first ? SCENE_COLOURS.firstHole : SCENE_COLOURS.boltHole} />
        </mesh>
      ))}
    </group>
  );
}
