import { FLANGE_SOURCES, FLANGE_TABLE, FLANGE_TABLE_NAMES, type FlangeRow } from './b16-5-flange-table';
import { weakestStatus, withStatusNote, type DataStatus } from './data-status';
import { found, missing, type Lookup } from './lookup-result';
import type { Nps } from './nps';
import { pipeDimensions } from './pipe-schedules';

/** ASME B16.5 pressure classes carried here (the only ones Tackline lays out). */
export type FlangeClass = 150 | 300 | 600;

/** Flange types carried here. */
export type FlangeType = 'weld-neck' | 'slip-on' | 'blind';

/** Classes and types as arrays, for schemas and pickers. */
export const FLANGE_CLASSES = [150, 300, 600] as const satisfies readonly FlangeClass[];

/** "Classes 150, 300 and 600": the supported classes as a refusal names them. */
export const SUPPORTED_FLANGE_CLASSES_TEXT = `Classes ${FLANGE_CLASSES.slice(0, -1).join(', ')} and ${String(FLANGE_CLASSES[FLANGE_CLASSES.length - 1])}`;

/** Whether Tackline has an ASME B16.5 table for `value` (a number from a form or a stored job). */
export function isSupportedFlangeClass(value: unknown): value is FlangeClass {
  return (FLANGE_CLASSES as readonly unknown[]).includes(value);
}

/** The refusal for a class without a table: names the class and the supported ones. */
export function unsupportedFlangeClassMessage(value: unknown): string {
  // Echo a short, printable form only: the value may be anything a client sent.
  const shown =
    typeof value === 'number' && Number.isFinite(value) && Math.abs(value) < 1e6
      ? String(value)
      : typeof value === 'string' && /^[0-9]{1,6}$/.test(value)
        ? value
        : null;
  return shown === null
    ? `The flange class must be one of ASME B16.5 ${SUPPORTED_FLANGE_CLASSES_TEXT}: Tackline has no other flange tables`
    : `ASME B16.5 Class ${shown} is not supported: Tackline has flange tables for ${SUPPORTED_FLANGE_CLASSES_TEXT} only`;
}
export const FLANGE_TYPES = ['weld-neck', 'slip-on', 'blind'] as const satisfies readonly FlangeType[];

/**
 * Raised-face height for Classes 150 and 300 in the B16.5 metric tables (2 mm; the inch
 * tables say 0.06 in = 1.6 mm, the height most inch-made flanges actually have).
 */
export const RAISED_FACE_MM = 2;

/**
 * Raised-face height for Class 400 and above in the B16.5 metric tables (7 mm; the inch
 * tables say 0.25 in = 6.4 mm). ASME B16.5-2009 Fig. 7.
 */
export const RAISED_FACE_HIGH_CLASS_MM = 7;

/** Raised-face height of a class, mm: 2 for Classes 150 and 300, 7 above. */
export function raisedFaceHeightMm(flangeClass: FlangeClass): number {
  return flangeClass <= 300 ? RAISED_FACE_MM : RAISED_FACE_HIGH_CLASS_MM;
}

/**
 * Which raised-face convention the flange data follows. Printed on sheets beside flange
 * dimensions so a checker using an older table is not misled.
 */
export const RAISED_FACE_CONVENTION =
  'ASME B16.5-2003 and later: flange thickness and length through hub exclude the raised face (2 mm for Classes 150 and 300, 7 mm for Class 600), which is given separately. Older Class 150 and 300 tables include a 1.6 mm face in both.';

/** Allowance added to the pipe wall for the slip-on setback (common practice, no source). */
export const SLIP_ON_SETBACK_ALLOWANCE_MM = 3;

/**
 * How far the pipe end of a slip-on flange sits back from the flange face, mm: pipe wall
 * plus about 3 mm, so the bore fillet weld does not reach the gasket face.
 * Common practice, no source: the shop's WPS or the client's spec may set another value.
 */
export function slipOnSetbackMm(wallMm: number): number {
  return wallMm + SLIP_ON_SETBACK_ALLOWANCE_MM;
}

/** Flange dimensions, mm unless the name says otherwise. */
export type FlangeDimensions = {
  odMm: number;
  boltCircleMm: number;
  boltCount: number;
  /** Hole diameter converted from B16.5's inch value (exact ×25.4). */
  boltHoleDiaMm: number;
  boltHoleDiaIn: string;
  /** Bolt or stud size, inches ('5/8'). */
  boltSizeIn: string;
  /** Flange thickness tf, excluding the raised face. */
  thicknessMm: number;
  /**
   * Length through hub Y excluding the raised face: weld neck from the back of the raised
   * face to the weld end; slip-on hub length; blind = its thickness.
   */
  hubLengthMm: number;
  /** Raised-face height, added to thickness and hub length to reach the gasket face. */
  raisedFaceMm: number;
  raisedFaceDiaMm: number;
  /** Hub diameter at the base X; absent for a blind flange (no hub). */
  hubDiaAtBaseMm?: number;
  /**
   * Slip-on only: pipe end set back from the gasket face (common practice, no source:
   * wall + 3 mm, using the given wall or STD wall when none is given).
   */
  slipOnSetbackMm?: number;
  /** Weakest status of the values returned. */
  status: DataStatus;
  /**
   * Status of each group of values: drilling (OD, bolt circle, count, hole and bolt size),
   * hub length (the Y returned as `hubLengthMm`; for a blind, its thickness) and body
   * (tf, X, R).
   */
  partStatus: { drilling: DataStatus; hubLength: DataStatus; body: DataStatus };
  /**
   * The standard and table as users see it ("ASME B16.5 Class 150"), followed by a plain
   * warning when a value used is not confirmed against the standard.
   */
  source: string;
  /** Where the table's values come from, for developers (standard, table, edition, row note). */
  tableSource: string;
};

/** Optional inputs: the wall of the pipe a slip-on receives (for its setback). */
export type FlangeOptions = { pipeWallMm?: number };

const BY_CLASS: Record<FlangeClass, Map<Nps, FlangeRow>> = {
  150: new Map<Nps, FlangeRow>(FLANGE_TABLE[150].map((r) => [r.nps, r])),
  300: new Map<Nps, FlangeRow>(FLANGE_TABLE[300].map((r) => [r.nps, r])),
  600: new Map<Nps, FlangeRow>(FLANGE_TABLE[600].map((r) => [r.nps, r])),
};

/** The class's row for a size; a class with no table is refused, never read as another. */
export function flangeRow(nps: Nps, flangeClass: FlangeClass): Lookup<FlangeRow> {
  if (!isSupportedFlangeClass(flangeClass)) return missing(unsupportedFlangeClassMessage(flangeClass));
  const row = BY_CLASS[flangeClass].get(nps);
  return row ? found(row) : missing(`No ASME B16.5 Class ${String(flangeClass)} flange data for NPS ${nps}`);
}

/** Inch fraction text ('1-1/8', '7/8', '1') to a number of inches. */
export function inchFractionToNumber(text: string): number {
  const m = /^(?:(\d+)-)?(\d+)(?:\/(\d+))?$/.exec(text);
  if (!m) return Number.NaN;
  const whole = m[1] ? Number(m[1]) : 0;
  return m[3] ? whole + Number(m[2]) / Number(m[3]) : whole + Number(m[2]);
}

/**
 * ASME B16.5 flange dimensions for one size, class and type (mm), 2003+ raised-face
 * convention (see {@link RAISED_FACE_CONVENTION}).
 */
export function flangeDimensions(
  nps: Nps,
  flangeClass: FlangeClass,
  type: FlangeType,
  options: FlangeOptions = {},
): Lookup<FlangeDimensions> {
  if (!isSupportedFlangeClass(flangeClass)) return missing(unsupportedFlangeClassMessage(flangeClass));
  const row = BY_CLASS[flangeClass].get(nps);
  if (!row) return missing(`No ASME B16.5 Class ${String(flangeClass)} ${type} flange data for NPS ${nps}`);
  const named = (status: DataStatus) => withStatusNote(FLANGE_TABLE_NAMES[flangeClass], status);
  const base = {
    odMm: row.odMm,
    boltCircleMm: row.boltCircleMm,
    boltCount: row.boltCount,
    boltHoleDiaMm: Math.round(inchFractionToNumber(row.holeIn) * 25.4 * 10) / 10,
    boltHoleDiaIn: row.holeIn,
    boltSizeIn: row.boltIn,
    thicknessMm: row.tfMm,
    raisedFaceMm: raisedFaceHeightMm(flangeClass),
    raisedFaceDiaMm: row.raisedFaceDiaMm,
    tableSource: FLANGE_SOURCES[flangeClass] + (row.note ? ` (NPS ${nps}: ${row.note})` : ''),
  };
  switch (type) {
    case 'weld-neck':
      return found({
        ...base,
        hubLengthMm: row.yWeldNeckMm,
        hubDiaAtBaseMm: row.hubBaseMm,
        status: weakestStatus(row.drillingStatus, row.yWeldNeckStatus, row.bodyStatus),
        source: named(weakestStatus(row.drillingStatus, row.yWeldNeckStatus, row.bodyStatus)),
        partStatus: { drilling: row.drillingStatus, hubLength: row.yWeldNeckStatus, body: row.bodyStatus },
      });
    case 'slip-on': {
      const wall = options.pipeWallMm ?? stdWall(nps);
      if (wall === undefined || !Number.isFinite(wall) || wall <= 0) {
        return missing(
          `A slip-on flange setback needs the pipe wall as a positive number of mm for NPS ${nps}`,
        );
      }
      return found({
        ...base,
        hubLengthMm: row.ySlipOnMm,
        hubDiaAtBaseMm: row.hubBaseMm,
        slipOnSetbackMm: slipOnSetbackMm(wall),
        status: weakestStatus(row.drillingStatus, row.bodyStatus),
        source: named(weakestStatus(row.drillingStatus, row.bodyStatus)),
        partStatus: { drilling: row.drillingStatus, hubLength: row.bodyStatus, body: row.bodyStatus },
      });
    }
    case 'blind':
      return found({
        ...base,
        hubLengthMm: row.tfMm,
        status: weakestStatus(row.drillingStatus, row.bodyStatus),
        source: named(weakestStatus(row.drillingStatus, row.bodyStatus)),
        partStatus: { drilling: row.drillingStatus, hubLength: row.bodyStatus, body: row.bodyStatus },
      });
  }
}

function stdWall(nps: Nps): number | undefined {
  const p = pipeDimensions(nps, 'STD');
  return p.ok ? p.value.wallMm : undefined;
}
