import { z } from 'zod';
import { weakestStatus, withStatusNote, type DataStatus } from './data-status';
import { found, missing, type Lookup } from './lookup-result';
import type { Nps } from './nps';
import { PIPE_TABLE, type PipeRow } from './pipe-schedule-table';

/** Wall designations of ASME B36.10M carried here: weight classes, then schedule numbers. */
export const SCHEDULE_VALUES = [
  'STD',
  'XS',
  'XXS',
  '10',
  '20',
  '30',
  '40',
  '60',
  '80',
  '120',
  '160',
] as const;

/** A wall designation: weight class (STD, XS, XXS) or schedule number. */
export type Schedule = (typeof SCHEDULE_VALUES)[number];

/** Zod schema for {@link Schedule}. */
export const scheduleSchema = z.enum(SCHEDULE_VALUES, {
  error: () => `Schedule must be one of ${SCHEDULE_VALUES.join(', ')}`,
});

/** Pipe dimensions for one NPS and schedule, all in mm (mass in kg/m). */
export type PipeDimensions = {
  odMm: number;
  wallMm: number;
  /** OD − 2 × wall. */
  idMm: number;
  /** Plain-end mass per metre from the B36.10M formula 0.0246615·(D − t)·t, steel. */
  massKgPerM: number;
  /** Weakest of the OD and wall statuses. */
  status: DataStatus;
  /** Status of the wall alone (the OD's is `status` when the wall is stronger). */
  wallStatus: DataStatus;
  /** "ASME B36.10M", with the plain warning when a value used is not confirmed. */
  source: string;
  /** Which tables the row came from, and caveats, for developers. */
  tableSource: string;
};

/** B36.10M plain-end mass constant for carbon steel, kg/m per mm² of (D − t)·t. */
export const B3610_MASS_CONSTANT = 0.0246615;

const ROWS = new Map<Nps, PipeRow>(PIPE_TABLE.map((r) => [r.nps, r]));

/**
 * Looks up pipe OD, wall, bore and mass per metre (ASME B36.10M, mm).
 * A schedule B36.10M does not give for that size (e.g. XXS above NPS 12) is a miss.
 */
export function pipeDimensions(nps: Nps, schedule: Schedule): Lookup<PipeDimensions> {
  const row = ROWS.get(nps);
  if (!row) return missing(`No ASME B36.10M pipe data for NPS ${nps}`);
  const cell = row.walls[schedule];
  if (!cell) return missing(`No ASME B36.10M wall for NPS ${nps} ${scheduleLabel(schedule)}`);
  const [wallMm, wallStatus] = cell;
  const d = row.odMm;
  return found({
    odMm: d,
    wallMm,
    idMm: round(d - 2 * wallMm, 2),
    massKgPerM: round(B3610_MASS_CONSTANT * (d - wallMm) * wallMm, 2),
    status: weakestStatus(row.odStatus, wallStatus),
    wallStatus,
    source: withStatusNote('ASME B36.10M', weakestStatus(row.odStatus, wallStatus)),
    tableSource: row.source,
  });
}

/** Outside diameter only, mm (needed where no schedule is known yet, e.g. templates). */
export function pipeOdMm(nps: Nps): Lookup<{ odMm: number; status: DataStatus; source: string }> {
  const row = ROWS.get(nps);
  if (!row) return missing(`No ASME B36.10M pipe data for NPS ${nps}`);
  return found({
    odMm: row.odMm,
    status: row.odStatus,
    source: withStatusNote('ASME B36.10M', row.odStatus),
  });
}

/** "Sch 40" for numbers, "STD" for weight classes: how a sheet writes it. */
export function scheduleLabel(schedule: Schedule): string {
  return /^\d+$/.test(schedule) ? `Sch ${schedule}` : schedule;
}

function round(x: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(x * f) / f;
}
