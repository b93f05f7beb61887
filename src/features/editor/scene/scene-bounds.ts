import type { SpoolResult } from '../../../../shared/engine/compute-result';
import { SCENE_UNITS_PER_MM } from './scene-units';

/** The model's box in scene units (m): centre, size and bounding-sphere radius. */
export type SceneBounds = { centre: [number, number, number]; size: [number, number, number]; radius: number; minZ: number };

/** Bounds of the spool's shipping envelope (or its work points), with a 1 m fallback. */
export function sceneBounds(result: SpoolResult | null): SceneBounds {
  const box = result?.overall?.envelopeBox ?? result?.overall?.workPointBox;
  if (!box) return { centre: [0, 0, 0], size: [1, 1, 1], radius: 1, minZ: 0 };
  const k = SCENE_UNITS_PER_MM;
  const size: [number, number, number] = [box.sizeMm.x * k, box.sizeMm.y * k, box.sizeMm.z * k];
  const centre: [number, number, number] = [
    ((box.min.x + box.max.x) / 2) * k,
    ((box.min.y + box.max.y) / 2) * k,
    ((box.min.z + box.max.z) / 2) * k,
  ];
  const radius = Math.max(0.3, Math.hypot(...size) / 2);
  return { centre, size, radius, minZ: box.min.z * k };
}
