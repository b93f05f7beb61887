/**
 * Small constructors for {@link NodeEnd} values, so each take-off step states only what
 * differs (take-off, joint, weld).
 */
import type { Nps } from '../standards/nps';
import type { WeldType } from './compute-result';
import type { Connection } from './classify-nodes';
import type { NodeEnd } from './node-analysis';
import { ZERO } from './vec3-math';

/** A butt-welded end: pipe end bevelled, one root gap (mm), take-off in mm. */
export function buttEnd(
  conn: Connection,
  nps: Nps | null,
  takeOffMm: number | null,
  gapMm: number,
  weldType: WeldType = 'butt',
): NodeEnd {
  return {
    conn,
    nps,
    takeOffMm,
    gapMm,
    joint: 'butt',
    portOffset: ZERO,
    pipeContinues: false,
    prep: 'weld-bevel',
    mitreCutDeg: null,
    weldType,
    weldCount: 1,
    shortPointTakeOffMm: null,
    pipeNeeded: null,
  };
}

/** A socket-welded end: square pipe end, take-off already includes the socket gap (mm). */
export function socketEnd(conn: Connection, nps: Nps | null, takeOffMm: number | null): NodeEnd {
  return {
    conn,
    nps,
    takeOffMm,
    gapMm: 0,
    joint: 'socket',
    portOffset: ZERO,
    pipeContinues: false,
    prep: 'square',
    mitreCutDeg: null,
    weldType: 'socket',
    weldCount: 1,
    shortPointTakeOffMm: null,
    pipeNeeded: null,
  };
}

/** An open pipe end (no weld at the node); `prep` bevel for field welds, square otherwise. */
export function openEnd(conn: Connection, nps: Nps | null, prep: 'weld-bevel' | 'square'): NodeEnd {
  return {
    conn,
    nps,
    takeOffMm: 0,
    gapMm: 0,
    joint: 'open',
    portOffset: ZERO,
    pipeContinues: false,
    prep,
    mitreCutDeg: null,
    weldType: null,
    weldCount: 0,
    shortPointTakeOffMm: null,
    pipeNeeded: null,
  };
}

/** A header passing straight through a branch connection: no take-off, no weld. */
export function throughEnd(conn: Connection, nps: Nps | null): NodeEnd {
  return {
    conn,
    nps,
    takeOffMm: 0,
    gapMm: 0,
    joint: 'set-on',
    portOffset: ZERO,
    pipeContinues: true,
    prep: 'square',
    mitreCutDeg: null,
    weldType: null,
    weldCount: 0,
    shortPointTakeOffMm: null,
    pipeNeeded: null,
  };
}

/** An end whose component has no usable data: unknown take-off, butt weld assumed. */
export function unknownEnd(conn: Connection, nps: Nps | null, gapMm: number): NodeEnd {
  return buttEnd(conn, nps, null, gapMm);
}
