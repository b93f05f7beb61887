import { Html } from '@react-three/drei';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { SCENE_COLOURS } from './scene-palette';
import { mmToScene, toScene } from './scene-units';
import { UNIT_OCTAHEDRON } from './shared-geometries';

/** The estimated centre of gravity (empty) with the spool's estimated weight. */
export function CentreOfGravityMarker({ position, emptyKg, sizeMm }: { position: Vec3; emptyKg: number; sizeMm: number }) {
  return (
    <group position={toScene(position)} name="centre-of-gravity">
      <mesh geometry={UNIT_OCTAHEDRON} scale={mmToScene(sizeMm)}>
        <meshBasicMaterial color={SCENE_COLOURS.cog} wireframe />
      </mesh>
      <Html center position={[0, 0, mmToScene(sizeMm * 2.2)]} style={{ pointerEvents: 'none' }} zIndexRange={[30, 0]}>
        <span className="block whitespace-nowrap rounded bg-state-shipped-bg px-1.5 py-0.5 text-[11px] font-semibold text-state-shipped-fg ring-1 ring-state-shipped-fg/30">
          CoG · {Math.round(emptyKg).toLocaleString('en-GB')} kg est.
        </span>
      </Html>
    </group>
  );
}
