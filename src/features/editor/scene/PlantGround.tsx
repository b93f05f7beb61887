import { useMemo } from 'react';
import { Html } from '@react-three/drei';
import { Shape, Vector3 } from 'three';
import { SCENE_COLOURS } from './scene-palette';
import type { SceneBounds } from './scene-bounds';

/**
 * The floor under the spool: a grid in plant metres (0.5 m or 1 m cells), the plant
 * axes (E, N, Up) at its corner and a north arrow, so every view says which way is which.
 */
export function PlantGround({ bounds }: { bounds: SceneBounds }) {
  const extent = Math.max(bounds.size[0], bounds.size[1], 1) * 1.6;
  const cell = extent > 12 ? 1 : 0.5;
  const size = Math.ceil(extent / cell / 2) * 2 * cell;
  const z = bounds.minZ - 0.05;
  const [cx, cy] = [Math.round(bounds.centre[0] / cell) * cell, Math.round(bounds.centre[1] / cell) * cell];
  const corner: [number, number, number] = [cx - size / 2, cy - size / 2, z];
  const axisLen = Math.max(0.4, size * 0.12);
  const arrow = useMemo(() => {
    const s = new Shape();
    const w = axisLen * 0.35;
    s.moveTo(0, w * 1.6);
    s.lineTo(w * 0.6, -w);
    s.lineTo(0, -w * 0.45);
    s.lineTo(-w * 0.6, -w);
    s.closePath();
    return s;
  }, [axisLen]);
  const north: [number, number, number] = [cx + size / 2 - axisLen, cy + size / 2 - axisLen, z + 0.002];

  return (
    <group name="ground">
      <gridHelper
        args={[size, Math.round(size / cell), SCENE_COLOURS.gridSection, SCENE_COLOURS.gridCell]}
        position={[cx, cy, z]}
        rotation={[Math.PI / 2, 0, 0]}
      />
      <group position={corner}>
        <AxisArrow dir={[1, 0, 0]} length={axisLen} colour={SCENE_COLOURS.axisEast} label="E" />
        <AxisArrow dir={[0, 1, 0]} length={axisLen} colour={SCENE_COLOURS.axisNorth} label="N" />
        <AxisArrow dir={[0, 0, 1]} length={axisLen} colour={SCENE_COLOURS.axisUp} label="Up" />
      </group>
      <group position={north}>
        <mesh>
          <shapeGeometry args={[arrow]} />
          <meshBasicMaterial color={SCENE_COLOURS.axisNorth} />
        </mesh>
        <Html position={[0, axisLen * 0.9, 0]} center style={{ pointerEvents: 'none' }}>
          <span className="font-display text-sm font-bold text-ok-600" aria-label="Plant north">N</span>
        </Html>
      </group>
    </group>
  );
}

function AxisArrow({ dir, length, colour, label }: { dir: [number, number, number]; length: number; colour: string; label: string }) {
  const direction = useMemo(() => new Vector3(...dir), [dir]);
  const origin = useMemo(() => new Vector3(0, 0, 0), []);
  return (
    <group>
      <arrowHelper args={[direction, origin, length, colour, length * 0.22, length * 0.12]} />
      <Html position={[dir[0] * length * 1.18, dir[1] * length * 1.18, dir[2] * length * 1.18]} center style={{ pointerEvents: 'none' }}>
        <span className="font-mono text-[11px] font-bold" style={{ color: colour }}>
          {label}
        </span>
      </Html>
    </group>
  );
}
