import { useMemo } from 'react';
import { Vector3 } from 'three';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { SCENE_COLOURS } from './scene-palette';
import { mmToScene, toVector3 } from './scene-units';

/**
 * Where the next run will go: an arrow from the open end it grows from, in the chosen
 * direction, as long as the typed length (or a short stub while none is typed); red
 * when no fitting makes that turn.
 */
export function NextRunPreview({ from, direction, lengthMm, valid }: { from: Vec3; direction: Vec3; lengthMm: number | null; valid: boolean }) {
  const dir = useMemo(() => toVector3(direction).normalize(), [direction]);
  const origin = useMemo(() => toVector3(from), [from]);
  const length = mmToScene(lengthMm && lengthMm > 0 ? lengthMm : 400);
  return (
    <arrowHelper
      key={`${dir.x},${dir.y},${dir.z},${origin.x},${origin.y},${origin.z},${length},${valid}`}
      args={[new Vector3().copy(dir), origin, length, valid ? SCENE_COLOURS.selected : SCENE_COLOURS.error, Math.min(0.25, length * 0.25), Math.min(0.12, length * 0.12)]}
    />
  );
}
