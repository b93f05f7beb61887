import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import { normalise, tidy } from './vector';

/** The six plant axis directions the toolbar offers, with their keys. */
export const PLANT_AXES = {
  east: { label: 'East', short: 'E', key: 'd', vector: { x: 1, y: 0, z: 0 } },
  west: { label: 'West', short: 'W', key: 'a', vector: { x: -1, y: 0, z: 0 } },
  north: { label: 'North', short: 'N', key: 'w', vector: { x: 0, y: 1, z: 0 } },
  south: { label: 'South', short: 'S', key: 's', vector: { x: 0, y: -1, z: 0 } },
  up: { label: 'Up', short: 'Up', key: 'q', vector: { x: 0, y: 0, z: 1 } },
  down: { label: 'Down', short: 'Dn', key: 'z', vector: { x: 0, y: 0, z: -1 } },
} as const satisfies Record<string, { label: string; short: string; key: string; vector: Vec3 }>;

/** One of the six plant axes. */
export type PlantAxis = keyof typeof PLANT_AXES;

/** The axis a direction lies along, or null for a skewed or rolling direction. */
export function axisOf(direction: Vec3): PlantAxis | null {
  const d = normalise(direction);
  for (const [name, axis] of Object.entries(PLANT_AXES) as [PlantAxis, (typeof PLANT_AXES)[PlantAxis]][]) {
    const v = axis.vector;
    if (Math.abs(d.x - v.x) < 1e-9 && Math.abs(d.y - v.y) < 1e-9 && Math.abs(d.z - v.z) < 1e-9) return name;
  }
  return null;
}

/**
 * Plain words for a direction: "East", or the components of a rolling direction
 * ("E 0.707 · N 0.5 · Up 0.5").
 */
export function describeDirection(direction: Vec3): string {
  const axis = axisOf(direction);
  if (axis) return PLANT_AXES[axis].label;
  const d = normalise(direction);
  const part = (v: number, pos: string, neg: string) =>
    Math.abs(v) < 1e-9 ? null : `${v > 0 ? pos : neg} ${Math.abs(v).toFixed(3)}`;
  return [part(d.x, 'E', 'W'), part(d.y, 'N', 'S'), part(d.z, 'Up', 'Dn')].filter(Boolean).join(' · ');
}

/**
 * A direction from offset components, the way a fitter states a rolling offset:
 * how far it goes east, north and up (any unit, only the ratio matters). Null for zero.
 */
export function directionFromOffsets(east: number, north: number, up: number): Vec3 | null {
  if (![east, north, up].every(Number.isFinite)) return null;
  if (Math.hypot(east, north, up) < 1e-9) return null;
  return tidy(normalise({ x: east, y: north, z: up }));
}
