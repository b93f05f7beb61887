/**
 * What a shop ships loose with every flange face of a spool: the stud bolts with their nuts
 * and the gasket for the joint to its mate (the mate is outside the spool).
 */
import { STUD_LENGTH_SOURCES, STUD_LENGTH_TABLE, type StudLengthRow } from './b16-5-bolting-table';
import { weakestStatus, withStatusNote, type DataStatus } from './data-status';
import {
  flangeRow,
  isSupportedFlangeClass,
  unsupportedFlangeClassMessage,
  type FlangeClass,
} from './flanges';
import { found, missing, type Lookup } from './lookup-result';
import type { Nps } from './nps';

/** Gasket kinds a job or design may choose. */
export const GASKET_TYPES = ['spiral-wound', 'sheet'] as const;
/** Gasket kind: ASME B16.20 spiral-wound (with centring ring) or ASME B16.21 flat sheet ring. */
export type GasketType = (typeof GASKET_TYPES)[number];

/** Default gasket kind and materials (common practice, no source: the job's spec decides). */
export const DEFAULT_GASKET_TYPE: GasketType = 'spiral-wound';
/** Gasket material printed when the spec names none, per kind (common practice, no source). */
export const DEFAULT_GASKET_MATERIAL: Record<GasketType, string> = {
  'spiral-wound': '304 stainless winding, flexible graphite filler, carbon-steel centring ring',
  sheet: 'compressed non-asbestos fibre sheet, 1.5 mm',
};
/**
 * Default stud and nut material: ASTM A193 B7 studs with A194 2H heavy hex nuts, the usual
 * carbon-steel pairing (B16.5 lists B7 among its high-strength bolting; the pairing is common
 * practice, no source).
 */
export const DEFAULT_BOLTING_MATERIAL = 'ASTM A193 B7 studs, A194 2H nuts';

/** One flange joint's stud bolts: count, diameter and length (points not included). */
export type StudBoltSet = {
  studCount: number;
  /** Stud diameter, inches as B16.5 writes it ('5/8'). */
  diameterIn: string;
  /** Stud length without the points, mm. */
  lengthMm: number;
  /** Heavy hex nuts: two per stud. */
  nutCount: number;
  status: DataStatus;
  /** "ASME B16.5 Class 150" with the plain warning when not confirmed. */
  source: string;
  tableSource: string;
};

const STUDS: Record<FlangeClass, Map<Nps, StudLengthRow>> = {
  150: new Map(STUD_LENGTH_TABLE[150].map((r) => [r.nps, r])),
  300: new Map(STUD_LENGTH_TABLE[300].map((r) => [r.nps, r])),
  600: new Map(STUD_LENGTH_TABLE[600].map((r) => [r.nps, r])),
};

/**
 * Stud bolts for one raised-face joint of size `nps` and class `flangeClass` (ASME B16.5):
 * the flange's bolt count and size, the tabulated stud length, two nuts per stud.
 * A class without a table is refused.
 */
export function studBoltSet(nps: Nps, flangeClass: FlangeClass): Lookup<StudBoltSet> {
  if (!isSupportedFlangeClass(flangeClass)) return missing(unsupportedFlangeClassMessage(flangeClass));
  const row = flangeRow(nps, flangeClass);
  if (!row.ok) return row;
  const len = STUDS[flangeClass].get(nps);
  if (!len) return missing(`No ASME B16.5 Class ${String(flangeClass)} stud-bolt length for NPS ${nps}`);
  const status = weakestStatus(row.value.drillingStatus, len.status);
  return found({
    studCount: row.value.boltCount,
    diameterIn: row.value.boltIn,
    lengthMm: len.lengthMm,
    nutCount: 2 * row.value.boltCount,
    status,
    source: withStatusNote(`ASME B16.5 Class ${String(flangeClass)}`, status),
    tableSource: STUD_LENGTH_SOURCES[flangeClass],
  });
}

/** A gasket for one raised-face joint. */
export type GasketSpec = {
  type: GasketType;
  /** "ASME B16.20" (spiral-wound) or "ASME B16.21" (sheet). */
  standard: string;
  /** "Gasket spiral-wound with centring ring, for RF flange" etc. */
  description: string;
};

/**
 * The gasket for an NPS / class raised-face joint. Both standards size the gasket by the
 * flange's NPS and class, so no dimension is carried here: the order names size, class and
 * standard. A class without a table is refused.
 */
export function gasketFor(nps: Nps, flangeClass: FlangeClass, type: GasketType): Lookup<GasketSpec> {
  if (!isSupportedFlangeClass(flangeClass)) return missing(unsupportedFlangeClassMessage(flangeClass));
  const row = flangeRow(nps, flangeClass);
  if (!row.ok) return row;
  return found(
    type === 'spiral-wound'
      ? { type, standard: 'ASME B16.20', description: 'Gasket spiral-wound with centring ring, RF' }
      : { type, standard: 'ASME B16.21', description: 'Gasket flat ring, sheet, RF (inside the bolts)' },
  );
}
