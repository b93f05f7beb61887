import { weakestStatus, withStatusNote, type DataStatus } from './data-status';
import { found, missing, type Lookup } from './lookup-result';
import type { Nps } from './nps';

/** ASME B16.11 socket-weld fitting kinds carried here. */
export type SocketFittingKind = 'elbow90' | 'elbow45' | 'tee' | 'coupling' | 'half-coupling' | 'cap';

/** All kinds, for schemas and pickers. */
export const SOCKET_FITTING_KINDS = [
  'elbow90',
  'elbow45',
  'tee',
  'coupling',
  'half-coupling',
  'cap',
] as const satisfies readonly SocketFittingKind[];

/**
 * Gap left between the pipe end and the socket bottom before welding, mm.
 * ASME B31.3 (socket-weld figures) asks for "approximately 1.5 mm" in its metric text and
 * 1/16 in in its inch text; 1.6 mm is the usual conversion. It is a fit-up gap, not a
 * finished dimension (B31.1 says about 2 mm). Shops may configure their own.
 */
export const SOCKET_EXPANSION_GAP_MM = 1.6;

/** Socket-weld fitting dimensions, mm. */
export type SocketWeldDimensions = {
  /** Socket bore B, minimum (the tolerance is plus only). */
  socketBoreMm: number;
  /** Socket depth J, minimum. */
  socketDepthMm: number;
  /**
   * Elbows and tees: A, centre to bottom of socket. Coupling: half the laying length
   * (centre of the coupling to either socket bottom). Half coupling: from the socket's
   * outside face to the socket bottom (= socket depth J).
   */
  centreToBottomMm: number;
  /**
   * Coupling: laying length E (socket bottom to socket bottom). Half coupling: overall
   * length F + J (the face it stands on to the socket face).
   */
  lengthMm?: number;
  /**
   * Half coupling only: F, bottom of the socket to the opposite face (the face welded to
   * the header), as ASME B16.11 defines it in its socket-welding dimensional tolerances.
   */
  socketBottomToFaceMm?: number;
  /** Socket wall C, average, Class 3000 (for weight estimates). */
  socketWallMm: number;
  /** Bore D of the fitting beyond the socket bottom (for weight estimates). */
  fittingBoreMm: number;
  status: DataStatus;
  source: string;
};

type Row = {
  nps: Nps;
  /** Socket bore B, minimum. */
  bore: number;
  /** Socket depth J, minimum. */
  depth: number;
  /** 90° elbow, tee and cross: centre to bottom of socket A. */
  a90: number;
  /** 45° elbow: centre to bottom of socket A. */
  a45: number;
  /** Coupling laying length E, socket bottom to socket bottom. */
  couplingE: number;
  /** Half coupling F, bottom of socket to opposite face (see the source note). */
  halfCouplingF: number;
  /** Socket wall C, average (Class 3000). */
  wall: number;
  /** Bore of the fitting D beyond the socket bottom. */
  boreD: number;
};

const SOURCE_2016 = 'ASME B16.11-2016 Class 3000 socket-weld fittings';
// Half-coupling F runs from the socket bottom to the opposite face (the ASME B16.11
// definition); unconfirmed against the standard's own table (status M until it is).
const SOURCE_HALF = 'ASME B16.11 Class 3000 half couplings, dimension F (bottom of socket to opposite face)';

/**
 * ASME B16.11-2016 Class 3000 socket-weld dimensions, metric (mm). Older metric editions
 * round J to 10 / 13 / 16 mm and give B as a mean (≈ 21.95 for NPS ½).
 */
// prettier-ignore
const ROWS: readonly Row[] = [
  { nps: '1/2', bore: 21.8, depth: 9.5, a90: 15.5, a45: 11.0, couplingE: 9.5, halfCouplingF: 22.5, wall: 4.67, boreD: 15.8 },
  { nps: '3/4', bore: 27.2, depth: 12.5, a90: 19.0, a45: 13.0, couplingE: 9.5, halfCouplingF: 24.0, wall: 4.90, boreD: 21.0 },
  { nps: '1', bore: 33.9, depth: 12.5, a90: 22.5, a45: 14.0, couplingE: 12.5, halfCouplingF: 28.5, wall: 5.69, boreD: 26.7 },
  { nps: '1-1/4', bore: 42.7, depth: 12.5, a90: 27.0, a45: 17.5, couplingE: 12.5, halfCouplingF: 30.0, wall: 6.07, boreD: 35.1 },
  { nps: '1-1/2', bore: 48.8, depth: 12.5, a90: 32.0, a45: 20.5, couplingE: 12.5, halfCouplingF: 32.0, wall: 6.35, boreD: 40.9 },
  { nps: '2', bore: 61.2, depth: 16.0, a90: 38.0, a45: 25.5, couplingE: 19.0, halfCouplingF: 41.0, wall: 6.93, boreD: 52.5 },
  { nps: '2-1/2', bore: 73.9, depth: 16.0, a90: 41.0, a45: 28.5, couplingE: 19.0, halfCouplingF: 43.0, wall: 8.76, boreD: 62.7 },
  { nps: '3', bore: 89.8, depth: 16.0, a90: 57.0, a45: 32.0, couplingE: 19.0, halfCouplingF: 44.5, wall: 9.52, boreD: 78.0 },
  { nps: '4', bore: 115.2, depth: 19.0, a90: 66.5, a45: 41.0, couplingE: 19.0, halfCouplingF: 48.0, wall: 10.69, boreD: 102.3 },
];

const BY_NPS = new Map<Nps, Row>(ROWS.map((r) => [r.nps, r]));

/** ASME B16.11 Class 3000 socket-weld fitting dimensions for one size and kind, mm. */
export function socketWeldDimensions(nps: Nps, kind: SocketFittingKind): Lookup<SocketWeldDimensions> {
  const row = BY_NPS.get(nps);
  if (!row) return missing(`No ASME B16.11 Class 3000 socket-weld ${kind} data for NPS ${nps}`);
  const socket = {
    socketBoreMm: row.bore,
    socketDepthMm: row.depth,
    socketWallMm: row.wall,
    fittingBoreMm: row.boreD,
  };
  switch (kind) {
    case 'elbow90':
    case 'tee':
      return found({
        ...socket,
        centreToBottomMm: row.a90,
        status: 'S',
        source: withStatusNote(SOURCE_2016, 'S'),
      });
    case 'elbow45':
      return found({
        ...socket,
        centreToBottomMm: row.a45,
        status: 'S',
        source: withStatusNote(SOURCE_2016, 'S'),
      });
    case 'coupling':
      return found({
        ...socket,
        centreToBottomMm: row.couplingE / 2,
        lengthMm: row.couplingE,
        status: 'S',
        source: withStatusNote(SOURCE_2016, 'S'),
      });
    case 'half-coupling':
      // The pipe seats in the one socket; centreToBottom is measured from the socket's outside
      // face. F runs from the socket bottom to the face on the header (ASME B16.11 dimension F,
      // "bottom of socket to opposite face"), so the coupling stands F + J proud of the header.
      // Marked M until F is checked against the standard's table: an earlier reading took the
      // same numbers as the overall length, which put the pipe end 12.5 mm (NPS 1) too deep.
      return found({
        ...socket,
        centreToBottomMm: row.depth,
        lengthMm: row.halfCouplingF + row.depth,
        socketBottomToFaceMm: row.halfCouplingF,
        status: weakestStatus('S', 'M'),
        source: withStatusNote(SOURCE_HALF, weakestStatus('S', 'M')),
      });
    case 'cap':
      return missing(
        `No ASME B16.11 Class 3000 socket-weld cap data for NPS ${nps}: cap lengths are not carried yet`,
      );
  }
}

/**
 * How far a pipe end goes into a socket, mm: socket depth less the expansion gap.
 * The cut length of a pipe between two sockets is C–C − (A₁ + gap) − (A₂ + gap).
 */
export function socketInsertionMm(socketDepthMm: number, gapMm: number = SOCKET_EXPANSION_GAP_MM): number {
  return socketDepthMm - gapMm;
}
