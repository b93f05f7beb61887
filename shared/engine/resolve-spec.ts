/**
 * Spec resolution: built-in defaults ← job defaults ← design spec ← run spec ← node spec.
 */
import type { SpecOverrides } from '../schemas/spool-design-spec.schema';
import { SOCKET_EXPANSION_GAP_MM } from '../standards/socket-weld-fittings';
import { DEFAULT_BOLTING_MATERIAL, DEFAULT_GASKET_TYPE } from '../standards/flange-joint-kits';
import type { ResolvedSpec } from './compute-result';

/**
 * Tackline's built-in defaults, used where neither the job nor the design says.
 * rootGapMm 3: open-root gaps are typically 1.6–3.2 mm (common practice; the WPS rules).
 * sawKerfMm 3, minPieceLengthMm 50: common practice, no source; shops set their own.
 * boltHoleToleranceMm 1.6: bolt-hole rotation at the bolt circle, from memory (PFI ES-3).
 * fittingAngleToleranceDeg 1: a degree is taken up at the welds of a standard elbow
 * (common practice, no source).
 * minBendAngleDeg 3: smaller bends are taken up at a straight butt weld instead of a
 * sliver of cut elbow (common practice, no source).
 * closeCoupleToleranceMm 2: ASME B16.9 tolerance table, centre-to-end of elbows and tees
 * ±2 mm for the common sizes (from memory; the table widens it for the largest sizes).
 * minWeldToeClearanceMm 50: weld toes kept apart so heat-affected zones do not overlap
 * (common practice, no source; many client specs ask for 50 mm or 4 × wall).
 * gasketType spiral-wound, boltingMaterial B7/2H: common practice, no source; the job decides.
 */
export const BUILT_IN_SPEC: ResolvedSpec = Object.freeze({
  nps: null,
  material: 'ASTM A106 Gr B',
  fittingMaterial: 'ASTM A234 WPB',
  flangeMaterial: 'ASTM A105',
  schedule: 'STD',
  flangeClass: 150,
  rootGapMm: 3,
  sawKerfMm: 3,
  minPieceLengthMm: 50,
  socketGapMm: SOCKET_EXPANSION_GAP_MM,
  boltHoleToleranceMm: 1.6,
  fittingAngleToleranceDeg: 1,
  minBendAngleDeg: 3,
  closeCoupleToleranceMm: 2,
  minWeldToeClearanceMm: 50,
  gasketType: DEFAULT_GASKET_TYPE,
  gasketMaterial: null,
  boltingMaterial: DEFAULT_BOLTING_MATERIAL,
});

/** Applies `overrides` (undefined fields ignored) on top of a resolved spec. */
export function applySpec(base: ResolvedSpec, overrides: SpecOverrides | undefined): ResolvedSpec {
  if (!overrides) return base;
  let out: ResolvedSpec | null = null;
  for (const key of Object.keys(overrides) as (keyof SpecOverrides)[]) {
    const value = overrides[key];
    if (value === undefined) continue;
    out ??= { ...base };
    (out as Record<string, unknown>)[key] = value;
  }
  return out ?? base;
}

/**
 * The design-wide spec: built-in defaults, then the job's defaults, then the design's own
 * `spec`. Runs and nodes layer their own `spec` on top (see {@link applySpec}).
 */
export function resolveSpec(
  design: { spec?: SpecOverrides | undefined },
  jobDefaults?: SpecOverrides,
): ResolvedSpec {
  return applySpec(applySpec(BUILT_IN_SPEC, jobDefaults), design.spec);
}
