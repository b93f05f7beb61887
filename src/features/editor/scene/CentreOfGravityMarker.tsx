import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { SCENE_COLOURS } from './scene-palette';
import { mmToScene, toScene } from './scene-units';
import { UNIT_OCTAHEDRON } from './shared-geometries';

/** The estimated centre of gravity (empty); its weight label is drawn with the other labels. */
export function CentreOfGravityMarker({ position, sizeMm }: { position: Vec3; sizeMm: number }) {
  return (
    <group position={toScene(position)} name="centre-of-gravity">
      <mesh geometry={UNIT_OCTAHEDRON} scale={mmToScene(sizeMm)}>
        <meshBasicMaterial color={SCENE_COLOURS.cog} wireframe />
      </mesh>
    </group>
  );
}
