import { ELBOW_SOURCES, ELBOW_TABLE, type ElbowRow } from './b16-9-elbow-table';
import { CAP_TABLE, REDUCER_CAP_SOURCES, REDUCER_TABLE } from './b16-9-reducer-cap-table';
import { REDUCING_TEE_TABLE, STRAIGHT_TEE_TABLE, TEE_SOURCES, type TeeRow } from './b16-9-tee-table';
import { weakestStatus, withStatusNote, type DataStatus } from './data-status';
import { found, missing, type Lookup } from './lookup-result';
import { compareNps, type Nps } from './nps';

/** Butt-weld elbow and return kinds of ASME B16.9. */
export type ElbowKind = 'LR90' | 'SR90' | 'LR45' | 'LR180' | 'SR180';

/** Dimensions of one elbow or return, mm. */
export type ElbowDimensions = {
  /** A for 90° elbows, B for the 45° elbow, O (centre-to-centre) for 180° returns. */
  centreToEndMm: number;
  /** K, back of the return to the face of its ends (180° only). */
  backToFaceMm?: number;
  /**
   * Centreline bend radius: the tabulated LR 90° A for long-radius kinds (1.5 × NPS in the
   * table's rounding, except NPS 1/2 and 3/4), SR 90° A for short-radius kinds. Use it for
   * elbows cut to other angles (take-off R·tan(θ/2)), never to re-derive B.
   */
  bendRadiusMm: number;
  status: DataStatus;
  source: string;
};

/** Run and outlet centre-to-end of a tee, mm. */
export type TeeDimensions = {
  runCentreToEndMm: number;
  branchCentreToEndMm: number;
  status: DataStatus;
  source: string;
};

/** Reducer end-to-end length H, mm. */
export type ReducerDimensions = { lengthMm: number; status: DataStatus; source: string };

/** Cap length, mm: E up to the limiting wall, E1 above it. */
export type CapDimensions = { lengthMm: number; limitingWallMm: number; status: DataStatus; source: string };

const KIND_WORDS: Record<ElbowKind, string> = {
  LR90: 'long-radius 90° elbow',
  SR90: 'short-radius 90° elbow',
  LR45: 'long-radius 45° elbow',
  LR180: 'long-radius 180° return',
  SR180: 'short-radius 180° return',
};

const ELBOWS = new Map<Nps, ElbowRow>(ELBOW_TABLE.map((r) => [r.nps, r]));
const TEES = new Map<string, TeeRow>(
  [...STRAIGHT_TEE_TABLE, ...REDUCING_TEE_TABLE].map((t) => [`${t.run}|${t.branch}`, t]),
);
const REDUCERS = new Map(REDUCER_TABLE.map((r) => [r.large, r]));
const CAPS = new Map(CAP_TABLE.map((r) => [r.nps, r]));

/** ASME B16.9 elbow or return dimensions for one size and kind (mm). */
export function elbowDimensions(nps: Nps, kind: ElbowKind): Lookup<ElbowDimensions> {
  const row = ELBOWS.get(nps);
  const none = `No ASME B16.9 ${KIND_WORDS[kind]} data for NPS ${nps}`;
  if (!row) return missing(none);
  switch (kind) {
    case 'LR90':
      if (!row.lr90) return missing(none);
      return found({
        centreToEndMm: row.lr90[0],
        bendRadiusMm: row.lr90[0],
        status: row.lr90[1],
        source: withStatusNote(ELBOW_SOURCES.lr90, row.lr90[1]),
      });
    case 'SR90':
      if (!row.sr90) return missing(none);
      return found({
        centreToEndMm: row.sr90[0],
        bendRadiusMm: row.sr90[0],
        status: row.sr90[1],
        source: withStatusNote(ELBOW_SOURCES.sr90, row.sr90[1]),
      });
    case 'LR45':
      if (!row.lr45 || !row.lr90) return missing(none);
      return found({
        centreToEndMm: row.lr45[0],
        bendRadiusMm: row.lr90[0],
        status: weakestStatus(row.lr45[1], row.lr90[1]),
        source: withStatusNote(ELBOW_SOURCES.lr45, weakestStatus(row.lr45[1], row.lr90[1])),
      });
    case 'LR180':
      if (!row.lr180 || !row.lr90) return missing(none);
      return found({
        centreToEndMm: row.lr180.o[0],
        backToFaceMm: row.lr180.k[0],
        bendRadiusMm: row.lr90[0],
        status: weakestStatus(row.lr180.o[1], row.lr180.k[1], row.lr90[1]),
        source: withStatusNote(
          ELBOW_SOURCES.lr180,
          weakestStatus(row.lr180.o[1], row.lr180.k[1], row.lr90[1]),
        ),
      });
    case 'SR180':
      if (!row.sr180 || !row.sr90) return missing(none);
      return found({
        centreToEndMm: row.sr180.o[0],
        backToFaceMm: row.sr180.k[0],
        bendRadiusMm: row.sr90[0],
        status: weakestStatus(row.sr180.o[1], row.sr180.k[1], row.sr90[1]),
        source: withStatusNote(
          ELBOW_SOURCES.sr180,
          weakestStatus(row.sr180.o[1], row.sr180.k[1], row.sr90[1]),
        ),
      });
  }
}

/** ASME B16.9 tee, straight (run = branch) or reducing outlet (branch smaller), mm. */
export function teeDimensions(runNps: Nps, branchNps: Nps): Lookup<TeeDimensions> {
  if (compareNps(branchNps, runNps) > 0) {
    return missing(
      `No ASME B16.9 tee has an NPS ${branchNps} outlet on an NPS ${runNps} run (the outlet cannot be larger than the run)`,
    );
  }
  const tee = TEES.get(`${runNps}|${branchNps}`);
  if (!tee) {
    return missing(
      runNps === branchNps
        ? `No ASME B16.9 straight tee data for NPS ${runNps}`
        : `No ASME B16.9 reducing tee data for NPS ${runNps} × ${runNps} × ${branchNps}`,
    );
  }
  return found({
    runCentreToEndMm: tee.c[0],
    branchCentreToEndMm: tee.m[0],
    status: weakestStatus(tee.c[1], tee.m[1]),
    source: withStatusNote(
      runNps === branchNps ? TEE_SOURCES.straight : TEE_SOURCES.reducing,
      weakestStatus(tee.c[1], tee.m[1]),
    ),
  });
}

/** ASME B16.9 concentric or eccentric reducer length H, mm (same for both). */
export function reducerDimensions(largeNps: Nps, smallNps: Nps): Lookup<ReducerDimensions> {
  if (compareNps(smallNps, largeNps) >= 0) {
    return missing(
      `A reducer from NPS ${largeNps} to NPS ${smallNps} is not a reduction: the large end must be the larger size`,
    );
  }
  const row = REDUCERS.get(largeNps);
  if (!row || !row.smallEnds.includes(smallNps)) {
    return missing(`No ASME B16.9 reducer data for NPS ${largeNps} × ${smallNps}`);
  }
  return found({
    lengthMm: row.h[0],
    status: weakestStatus(row.h[1], row.smallEndsStatus),
    source: withStatusNote(REDUCER_CAP_SOURCES.reducer, weakestStatus(row.h[1], row.smallEndsStatus)),
  });
}

/**
 * ASME B16.9 cap length for a size and the wall it is welded to (mm): E up to the
 * limiting wall, E1 above it. A wall that is not a positive number is a miss.
 */
export function capDimensions(nps: Nps, wallMm: number): Lookup<CapDimensions> {
  if (!Number.isFinite(wallMm) || wallMm <= 0) {
    return missing(`A cap needs the pipe wall thickness as a positive number of mm (got ${String(wallMm)})`);
  }
  const row = CAPS.get(nps);
  if (!row) return missing(`No ASME B16.9 cap data for NPS ${nps}`);
  const thick = wallMm > row.limitingWallMm[0];
  const cell = thick ? row.e1 : row.e;
  const capStatus = row.e[0] === row.e1[0] ? cell[1] : weakestStatus(cell[1], row.limitingWallMm[1]);
  return found({
    lengthMm: cell[0],
    limitingWallMm: row.limitingWallMm[0],
    // The limiting wall is from memory: it only matters when E and E1 differ.
    status: capStatus,
    source: withStatusNote(REDUCER_CAP_SOURCES.cap, capStatus),
  });
}
