import { useMemo } from 'react';
import { Shape, Vector3 } from 'three';
import { SCENE_COLOURS } from './scene-palette';
import type { SceneBounds } from './scene-bounds';
import type { SceneLabel } from './DimensionLabels';

/**
 * The floor under the spool: a grid in plant metres (0.5 m or 1 m cells), the plant
 * axes (E, N, Up) at its corner and a north arrow, so every view says which way is which.
 */
export function PlantGround({ bounds }: { bounds: SceneBounds }) {
  const { cell, size, z, cx, cy, corner, axisLen, north } = groundLayout(bounds);
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
      </group>
    </group>
  );
}

function AxisArrow({
  dir,
  length,
  colour,
}: {
  dir: [number, number, number];
  length: number;
  colour: string;
  label: string;
}) {
  const direction = useMemo(() => new Vector3(...dir), [dir]);
  const origin = useMemo(() => new Vector3(0, 0, 0), []);
  return (
    <group>
      <arrowHelper args={[direction, origin, length, colour, length * 0.22, length * 0.12]} />
    </group>
  );
}

/** Grid size and where the axes and north arrow sit, in scene units, for a model's bounds. */
function groundLayout(bounds: SceneBounds) {
  const extent = Math.max(bounds.size[0], bounds.size[1], 1) * 1.6;
  const cell = extent > 12 ? 1 : 0.5;
  const size = Math.ceil(extent / cell / 2) * 2 * cell;
  const z = bounds.minZ - 0.05;
  const [cx, cy] = [Math.round(bounds.centre[0] / cell) * cell, Math.round(bounds.centre[1] / cell) * cell];
  const corner: [number, number, number] = [cx - size / 2, cy - size / 2, z];
  const axisLen = Math.max(0.4, size * 0.12);
  const north: [number, number, number] = [cx + size / 2 - axisLen, cy + size / 2 - axisLen, z + 0.002];
  return { cell, size, z, cx, cy, corner, axisLen, north };
}

/** The E / N / Up axis letters and the north arrow's N, drawn with the other labels. */
export function groundLabelItems(bounds: SceneBounds): SceneLabel[] {
  const { corner, axisLen, north } = groundLayout(bounds);
  const tip = (dir: [number, number, number]): [number, number, number] => [
    corner[0] + dir[0] * axisLen * 1.18,
    corner[1] + dir[1] * axisLen * 1.18,
    corner[2] + dir[2] * axisLen * 1.18,
  ];
  return [
    { key: 'a-E', at: tip([1, 0, 0]), text: 'E', tone: 'axis', colour: SCENE_COLOURS.axisEast },
    { key: 'a-N', at: tip([0, 1, 0]), text: 'N', tone: 'axis', colour: SCENE_COLOURS.axisNorth },
    { key: 'a-Up', at: tip([0, 0, 1]), text: 'Up', tone: 'axis', colour: SCENE_COLOURS.axisUp },
    { key: 'a-north', at: [north[0], north[1] + axisLen * 0.9, north[2]], text: 'N', tone: 'north' },
  ];
}
