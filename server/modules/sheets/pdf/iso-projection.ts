import type { Vec3 } from '../../../../shared/schemas/spool-design-primitives.schema';
import type { Rect } from './page-setup';

/** Unit vectors of the plant axes: x east, y north, z up. */
export const PLANT_AXES: Record<'x' | 'y' | 'z', Vec3> = {
  x: { x: 1, y: 0, z: 0 },
  y: { x: 0, y: 1, z: 0 },
  z: { x: 0, y: 0, z: 1 },
};

/** A point in the drawing plane, mm (u to the right, v up). */
export interface IsoPoint {
  u: number;
  v: number;
}

const COS30 = Math.cos(Math.PI / 6);
const SIN30 = 0.5;

/**
 * True isometric projection of plant coordinates (x east, y north, z up) as seen from the
 * south-west and above: east runs up to the right at 30°, north up to the left at 30°, up is up.
 * Lengths along the three plant axes are all foreshortened alike, so a drawing scale holds on
 * every axis; the printed dimensions, not the drawing, carry the numbers.
 */
export function isoProject(p: Vec3): IsoPoint {
  return { u: (p.x - p.y) * COS30, v: (p.x + p.y) * SIN30 + p.z };
}

/** Projects a direction (no translation); not normalised. */
export function isoProjectDirection(d: Vec3): IsoPoint {
  return isoProject(d);
}

/** Maps drawing-plane mm to page points: a uniform scale and offset that fits a box into a frame. */
export interface IsoViewport {
  scale: number;
  toPage(p: IsoPoint): { x: number; y: number };
  project(p: Vec3): { x: number; y: number };
}

/**
 * Fits projected points into a page rectangle with a margin, keeping the aspect ratio (y flips:
 * the page's y runs down). A single point or an empty list gets a nominal 1:20 view centred in the frame.
 */
export function fitIsoViewport(points: Vec3[], frame: Rect, marginPt: number): IsoViewport {
  const projected = points.map(isoProject);
  let minU = Infinity;
  let maxU = -Infinity;
  let minV = Infinity;
  let maxV = -Infinity;
  for (const p of projected) {
    minU = Math.min(minU, p.u);
    maxU = Math.max(maxU, p.u);
    minV = Math.min(minV, p.v);
    maxV = Math.max(maxV, p.v);
  }
  if (!Number.isFinite(minU)) {
    minU = maxU = minV = maxV = 0;
  }
  const spanU = maxU - minU;
  const spanV = maxV - minV;
  const innerW = Math.max(1, frame.w - 2 * marginPt);
  const innerH = Math.max(1, frame.h - 2 * marginPt);
  const nominal = 72 / 25.4 / 20;
  const scale = Math.min(
    spanU > 1e-6 ? innerW / spanU : Infinity,
    spanV > 1e-6 ? innerH / spanV : Infinity,
    Infinity,
  );
  const s = Number.isFinite(scale) ? scale : nominal;
  const cu = (minU + maxU) / 2;
  const cv = (minV + maxV) / 2;
  const cx = frame.x + frame.w / 2;
  const cy = frame.y + frame.h / 2;
  const toPage = (p: IsoPoint) => ({ x: cx + (p.u - cu) * s, y: cy - (p.v - cv) * s });
  return { scale: s, toPage, project: (p: Vec3) => toPage(isoProject(p)) };
}
