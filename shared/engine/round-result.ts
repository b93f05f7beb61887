/**
 * Final pass over a result: rounds every number to a fixed precision (stable JSON, no
 * float noise such as 535.9999999) and turns -0 into 0. A non-finite number would be an
 * engine bug: it becomes null and an `internal-error` issue, so no NaN ever leaves.
 *
 * In place, writing only values that change: shared constants (frozen, already round) are
 * never written, and nothing from the caller's design reaches the result uncopied.
 */
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import type { RotationCorrection, SpoolResult } from './compute-result';

/** Decimal places kept in results (mm, degrees, kg and unit vectors alike). */
export const RESULT_DECIMALS = 4;
const F = 10 ** RESULT_DECIMALS;

type Counter = { bad: number };

// Named property access at fixed sites (no `o[k]` with a variable key): keyed access across
// many object shapes is what made a generic pass the slowest step of the engine.
function n(v: number, c: Counter): number {
  if (!Number.isFinite(v)) {
    // Only an engine bug gets here; the null is reported as an internal-error issue.
    c.bad++;
    return null as unknown as number;
  }
  return Math.round(v * F) / F || 0;
}
function nn(v: number | null, c: Counter): number | null {
  return v === null ? null : n(v, c);
}

function vec(p: Vec3 | null | undefined, c: Counter): void {
  if (!p) return;
  const x = n(p.x, c);
  const y = n(p.y, c);
  const z = n(p.z, c);
  // Shared constant vectors are frozen and already round: write only what changes.
  if (!Object.is(x, p.x)) p.x = x;
  if (!Object.is(y, p.y)) p.y = y;
  if (!Object.is(z, p.z)) p.z = z;
}

function correction(k: RotationCorrection | null, c: Counter): void {
  if (!k) return;
  k.rotateClockwiseLookingAtFaceDeg = n(k.rotateClockwiseLookingAtFaceDeg, c);
  k.atBoltCircleMm = nn(k.atBoltCircleMm, c);
}

/** Rounds every number of any value (in place): the generic pass, used for shape data. */
export function roundEverything(value: object, c: Counter = { bad: 0 }): Counter {
  const walk = (o: Record<string, unknown>): void => {
    for (const k of Object.keys(o)) {
      const v = o[k];
      if (typeof v === 'number') {
        const r = n(v, c);
        if (!Object.is(r, v)) o[k] = r;
      } else if (v !== null && typeof v === 'object') walk(v as Record<string, unknown>);
    }
  };
  walk(value as Record<string, unknown>);
  return c;
}

/** Rounds every number of `result` (in place) and returns it. */
export function roundResult(result: SpoolResult): SpoolResult {
  const c: Counter = { bad: 0 };
  const s = result.spec;
  if (!Object.isFrozen(s)) {
    s.rootGapMm = n(s.rootGapMm, c);
    s.sawKerfMm = n(s.sawKerfMm, c);
    s.minPieceLengthMm = n(s.minPieceLengthMm, c);
    s.socketGapMm = n(s.socketGapMm, c);
    s.boltHoleToleranceMm = n(s.boltHoleToleranceMm, c);
  }
  for (const w of result.workPoints) vec(w.position, c);
  for (const comp of result.components) {
    vec(comp.position, c);
    for (const e of comp.ends) {
      vec(e.point, c);
      vec(e.outward, c);
      e.odMm = nn(e.odMm, c);
      e.takeOffMm = nn(e.takeOffMm, c);
    }
    comp.massKg = nn(comp.massKg, c);
    roundEverything(comp.shape, c);
  }
  for (const r of result.runs) {
    vec(r.direction, c);
    vec(r.start, c);
    vec(r.end, c);
    r.statedMm = n(r.statedMm, c);
    r.workPointDistanceMm = n(r.workPointDistanceMm, c);
    r.takeOffFromMm = nn(r.takeOffFromMm, c);
    r.takeOffToMm = nn(r.takeOffToMm, c);
    r.gapsMm = n(r.gapsMm, c);
    r.pipeLengthMm = nn(r.pipeLengthMm, c);
  }
  for (const p of result.pieces) {
    p.odMm = nn(p.odMm, c);
    p.wallMm = nn(p.wallMm, c);
    p.cutLengthMm = nn(p.cutLengthMm, c);
    p.shortPointLengthMm = nn(p.shortPointLengthMm, c);
    p.fieldFitAllowanceMm = n(p.fieldFitAllowanceMm, c);
    p.stockLengthMm = nn(p.stockLengthMm, c);
    p.massKg = nn(p.massKg, c);
    vec(p.start, c);
    vec(p.end, c);
    for (const e of p.ends) if (e.mitreCutDeg !== undefined) e.mitreCutDeg = n(e.mitreCutDeg, c);
  }
  for (const w of result.welds) {
    w.diameterInches = n(w.diameterInches, c);
    vec(w.position, c);
  }
  result.diameterInches = n(result.diameterInches, c);
  for (const f of result.flanges) {
    f.boltCount = nn(f.boltCount, c);
    f.boltCircleMm = nn(f.boltCircleMm, c);
    f.rotationDeg = n(f.rotationDeg, c);
    f.bendPlaneRotationDeg = nn(f.bendPlaneRotationDeg, c);
    f.raisedFaceMm = nn(f.raisedFaceMm, c);
    vec(f.faceCentre, c);
    vec(f.outward, c);
    vec(f.firstHoleDirection, c);
    correction(f.correction, c);
  }
  for (const p of result.flangePairs) {
    p.errorDeg = nn(p.errorDeg, c);
    p.errorMm = nn(p.errorMm, c);
    p.toleranceMm = n(p.toleranceMm, c);
    correction(p.correction, c);
  }
  for (const o of result.openEnds) {
    vec(o.facePoint, c);
    vec(o.outward, c);
    o.centreToFaceMm = nn(o.centreToFaceMm, c);
  }
  if (result.overall) {
    for (const b of [result.overall.workPointBox, result.overall.envelopeBox]) {
      vec(b.min, c);
      vec(b.max, c);
      vec(b.sizeMm, c);
    }
  }
  for (const i of result.bom.items) {
    i.count = n(i.count, c);
    i.totalCutMm = nn(i.totalCutMm, c);
    i.totalStockMm = nn(i.totalStockMm, c);
  }
  const w = result.weights;
  w.emptyKg = n(w.emptyKg, c);
  w.waterKg = n(w.waterKg, c);
  w.waterFilledKg = n(w.waterFilledKg, c);
  vec(w.centreOfGravity, c);
  vec(w.centreOfGravityFilled, c);
  for (const i of w.items) {
    i.massKg = n(i.massKg, c);
    i.waterKg = n(i.waterKg, c);
    vec(i.centroid, c);
  }
  if (c.bad > 0) {
    result.issues.push({
      severity: 'error',
      code: 'internal-error',
      message: `Engine produced ${c.bad} non-finite number(s)`,
    });
    result.ok = false;
  }
  return result;
}
