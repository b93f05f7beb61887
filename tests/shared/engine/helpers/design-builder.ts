import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import type { SpoolNode } from '../../../../shared/schemas/spool-design-node.schema';
import type { SpoolRun } from '../../../../shared/schemas/spool-design-run.schema';
import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import type { SpecOverrides } from '../../../../shared/schemas/spool-design-spec.schema';

export const EAST: Vec3 = { x: 1, y: 0, z: 0 };
export const WEST: Vec3 = { x: -1, y: 0, z: 0 };
export const NORTH: Vec3 = { x: 0, y: 1, z: 0 };
export const SOUTH: Vec3 = { x: 0, y: -1, z: 0 };
export const UP: Vec3 = { x: 0, y: 0, z: 1 };
export const DOWN: Vec3 = { x: 0, y: 0, z: -1 };

/** A design from nodes and runs, at the plant origin unless told. */
export function design(
  nodes: SpoolNode[],
  runs: SpoolRun[],
  spec: SpecOverrides = {},
  origin: Vec3 = { x: 0, y: 0, z: 0 },
): SpoolDesign {
  return { format: 'tackline.spool', version: 1, spec, origin, nodes, runs };
}

/** A run; `kind` defaults to centre-to-centre. */
export function run(
  id: string,
  from: string,
  to: string,
  direction: Vec3,
  mm: number,
  kind: SpoolRun['length']['kind'] = 'centre-to-centre',
  extra: Partial<SpoolRun> = {},
): SpoolRun {
  return { id, from, to, direction, length: { mm, kind }, ...extra };
}

export const wn = (id: string, extra: Record<string, unknown> = {}): SpoolNode =>
  ({ id, kind: 'end', end: { type: 'weld-neck-flange', ...extra } }) as SpoolNode;
export const bevel = (id: string, fieldWeld = true): SpoolNode => ({
  id,
  kind: 'end',
  end: { type: 'bevel', fieldWeld },
});
export const elbow = (id: string, radius: 'long' | 'short' = 'long'): SpoolNode => ({
  id,
  kind: 'elbow',
  radius,
});
export const socket = (id: string): SpoolNode => ({ id, kind: 'socket-fitting' });
export const plain = (id: string): SpoolNode => ({ id, kind: 'end', end: { type: 'plain' } });

/** Direction at `deg` from `a` towards `b` (unit vectors, perpendicular). */
export function between(a: Vec3, b: Vec3, deg: number): Vec3 {
  const r = (deg * Math.PI) / 180;
  return {
    x: a.x * Math.cos(r) + b.x * Math.sin(r),
    y: a.y * Math.cos(r) + b.y * Math.sin(r),
    z: a.z * Math.cos(r) + b.z * Math.sin(r),
  };
}
