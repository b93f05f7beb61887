/**
 * Places the spool: converts each run's stated length into a work-point distance (or a
 * cut length into one), finds the pipe length left between the take-offs, detects fittings
 * welded straight together, and walks the tree from the root to give every node and run
 * end its plant position.
 */
import type { SpoolRun } from '../schemas/spool-design-run.schema';
import { runRef } from './component-refs';
import type { Vec3 } from '../schemas/spool-design-primitives.schema';
import type { SpoolGraph } from './build-graph';
import { addError, addWarning, type IssueSink } from './issues';
import type { NodeAnalysis, NodeEnd } from './node-analysis';
import { add, addScaled, sub, ZERO } from './vec3-math';
import { analysisWords } from './shop-words';

/** A run's lengths and its placement, mm / plant coordinates. */
export type PlacedRun = {
  run: SpoolRun;
  direction: Vec3;
  fromEnd: NodeEnd | null;
  toEnd: NodeEnd | null;
  /** Port-to-port distance along the run, mm. */
  workPointDistanceMm: number;
  takeOffFromMm: number | null;
  takeOffToMm: number | null;
  /** Root gaps on this run, mm (one when close-coupled, none at an open end). */
  gapsMm: number;
  /** Gap placed at each end, mm (for weld positions). */
  gapFromMm: number;
  gapToMm: number;
  pipeLengthMm: number | null;
  closeCoupled: boolean;
  start: Vec3;
  end: Vec3;
};

/** Distance tolerances, mm. */
export type LengthTolerance = {
  /**
   * Fitting ends within this of one root gap apart weld straight together (no pipe), mm:
   * the fittings' own dimensional tolerance (spec `closeCoupleToleranceMm`).
   */
  closeCoupleMm: number;
};

/** Below this a close-coupled gap differs from the root gap only by rounding: no warning, mm. */
export const CLOSE_COUPLE_QUIET_MM = 0.05;

/** Finds the end of `analysis` that joins `runId`. */
export function endFor(analysis: NodeAnalysis | undefined, runId: string): NodeEnd | null {
  if (!analysis) return null;
  for (const e of analysis.ends) if (e.conn.run.id === runId) return e;
  return null;
}

/** Places every reachable run and node. */
export function placeRuns(
  graph: SpoolGraph,
  analyses: Map<string, NodeAnalysis>,
  directions: Map<string, Vec3>,
  origin: Vec3,
  tolFor: (runId: string) => LengthTolerance,
  issues: IssueSink,
): { runs: Map<string, PlacedRun>; positions: Map<string, Vec3> } {
  const positions = new Map<string, Vec3>();
  const runs = new Map<string, PlacedRun>();
  if (graph.rootId === null) return { runs, positions };
  // A copy: results are rounded in place and must not touch the caller's design.
  positions.set(graph.rootId, { x: origin.x, y: origin.y, z: origin.z });

  for (const run of graph.runOrder) {
    const from = positions.get(run.from);
    if (!from) continue;
    const d = directions.get(run.id)!;
    const fromEnd = endFor(analyses.get(run.from), run.id);
    const toEnd = endFor(analyses.get(run.to), run.id);
    const fa = analyses.get(run.from);
    const ta = analyses.get(run.to);
    const words = fa && ta ? { from: analysisWords(fa), to: analysisWords(ta) } : undefined;
    const len = runLengths(run, fromEnd, toEnd, tolFor(run.id), issues, words);
    const start = add(from, fromEnd?.portOffset ?? ZERO);
    const end = addScaled(start, d, len.workPointDistanceMm);
    positions.set(run.to, sub(end, toEnd?.portOffset ?? ZERO));
    runs.set(run.id, {
      run,
      direction: d,
      fromEnd,
      toEnd,
      start,
      end,
      workPointDistanceMm: len.workPointDistanceMm,
      takeOffFromMm: len.takeOffFromMm,
      takeOffToMm: len.takeOffToMm,
      gapsMm: len.gapsMm,
      gapFromMm: len.gapFromMm,
      gapToMm: len.gapToMm,
      pipeLengthMm: len.pipeLengthMm,
      closeCoupled: len.closeCoupled,
    });
    checkLengthKind(run, graph, issues);
  }
  return { runs, positions };
}

type Lengths = Omit<PlacedRun, 'run' | 'direction' | 'fromEnd' | 'toEnd' | 'start' | 'end'>;

/** The lengths of one run from its stated length and its two ends' take-offs. */
export function runLengths(
  run: SpoolRun,
  fromEnd: NodeEnd | null,
  toEnd: NodeEnd | null,
  tol: LengthTolerance,
  issues: IssueSink,
  words?: { from: string; to: string },
): Lengths {
  const tF = fromEnd ? fromEnd.takeOffMm : null;
  const tT = toEnd ? toEnd.takeOffMm : null;
  const gF = fromEnd?.gapMm ?? 0;
  const gT = toEnd?.gapMm ?? 0;
  const openF = !fromEnd || fromEnd.joint === 'open';
  const openT = !toEnd || toEnd.joint === 'open';
  const single = openF || openT ? 0 : Math.max(gF, gT);
  const noCouple = (e: NodeEnd | null) =>
    e !== null && (e.joint === 'socket' || e.joint === 'slip-on' || e.pipeContinues);
  const cannotCouple = noCouple(fromEnd) ? fromEnd : noCouple(toEnd) ? toEnd : null;
  const bothOpen = openF && openT;
  const known = tF !== null && tT !== null;
  const stated = run.length.mm;
  // Plain literals, no object spread: this runs for every run on every keystroke.
  const mk = (
    workPointDistanceMm: number,
    gapsMm: number,
    gapFromMm: number,
    gapToMm: number,
    pipeLengthMm: number | null,
    closeCoupled: boolean,
  ): Lengths => ({
    workPointDistanceMm,
    takeOffFromMm: tF,
    takeOffToMm: tT,
    gapsMm,
    gapFromMm,
    gapToMm,
    pipeLengthMm,
    closeCoupled,
  });

  if (run.length.kind === 'cut') {
    if (stated === 0 && !bothOpen) {
      if (cannotCouple) {
        addError(
          issues,
          'overlapping-fittings',
          `${runRef(run.id)} has no pipe, but a ${cannotCouple.joint === 'set-on' ? 'branch connection' : cannotCouple.joint} joint needs pipe`,
          run.id,
        );
        return mk((tF ?? 0) + (tT ?? 0), 0, 0, 0, null, false);
      }
      return mk(
        (tF ?? 0) + (tT ?? 0) + single,
        single,
        openF ? 0 : single / 2,
        openT ? 0 : single / 2,
        known ? 0 : null,
        true,
      );
    }
    if (known) checkPipeNeeded(run, fromEnd, toEnd, stated, 0, issues, words);
    return mk(stated + (tF ?? 0) + (tT ?? 0) + gF + gT, gF + gT, gF, gT, known ? stated : null, false);
  }

  if (!known) return mk(stated, gF + gT, gF, gT, null, false);
  // Within the fittings' own tolerance of one root gap apart, fittings weld straight
  // together: checked before the pipe, so a zero root gap does not leave a 0 mm "pipe".
  const coupled = stated - tF - tT - single;
  if (Math.abs(coupled) <= tol.closeCoupleMm && !cannotCouple && !bothOpen) {
    if (Math.abs(coupled) > CLOSE_COUPLE_QUIET_MM) {
      const between = words ? `${words.from} and ${words.to}` : 'fittings';
      addWarning(
        issues,
        'close-coupled-gap',
        `The ${between} weld straight together with no pipe: their ends are ${round2(coupled + single)} mm apart where the root gap is ${round2(single)} mm (${coupled > 0 ? 'wider' : 'tighter'} by ${round2(Math.abs(coupled))} mm, within the ${round2(tol.closeCoupleMm)} mm fitting tolerance): fit to the gap as found or correct the dimension`,
        run.id,
      );
    }
    return mk(stated, single, openF ? 0 : single / 2, openT ? 0 : single / 2, 0, true);
  }
  const pipe = stated - tF - tT - gF - gT;
  if (pipe >= 0) {
    checkPipeNeeded(run, fromEnd, toEnd, pipe, stated, issues, words);
    return mk(stated, gF + gT, gF, gT, pipe, false);
  }
  if (coupled < 0) {
    addError(
      issues,
      'overlapping-fittings',
      `${runRef(run.id)}: ${round(stated)} mm is ${round(-coupled)} mm less than the fittings take up (take-offs ${round(tF)} + ${round(tT)} mm${single ? ` + ${round(single)} mm root gap` : ''}); the fittings would overlap`,
      run.id,
    );
  } else {
    addError(
      issues,
      'piece-too-short',
      `${runRef(run.id)}: ${round(coupled + single)} mm between the fitting ends is more than one root gap but too short for a pipe piece with two welds`,
      run.id,
    );
  }
  return mk(stated, gF + gT, gF, gT, null, false);
}

/**
 * A pipe shorter than its ends need (a slip-on's hub and fillet) is an error naming the
 * pipe and the run length needed. `stated` is the run's stated distance (0 for a cut length).
 */
function checkPipeNeeded(
  run: SpoolRun,
  fromEnd: NodeEnd | null,
  toEnd: NodeEnd | null,
  pipe: number,
  stated: number,
  issues: IssueSink,
  words: { from: string; to: string } | undefined,
): void {
  const nf = fromEnd?.pipeNeeded ?? null;
  const nt = toEnd?.pipeNeeded ?? null;
  if (!nf && !nt) return;
  const need = (nf?.mm ?? 0) + (nt?.mm ?? 0);
  if (pipe >= need - 1e-6) return;
  const why = [nf?.why, nt?.why].filter(Boolean).join('; ');
  // How far the pipe end sits inside the component when only one end has a need.
  const deepest = Math.max(nf?.insideMm ?? 0, nt?.insideMm ?? 0);
  const short =
    nf && nt
      ? 'the welds cannot be made'
      : pipe < deepest
        ? `its end sits ${round(deepest - pipe)} mm inside the hub, so neither weld can be made`
        : 'the hub fillet runs into the next weld';
  const where = words ? ` between the ${words.from} and the ${words.to}` : '';
  const runText =
    run.length.kind === 'cut'
      ? `cut the pipe at least ${round(need)} mm`
      : `make the ${run.length.kind} dimension at least ${round(stated + need - pipe)} mm`;
  addError(
    issues,
    'pipe-inside-hub',
    `The ${round(pipe)} mm pipe${where} is too short: ${short}. It needs at least ${round(need)} mm: ${why}; ${runText}`,
    run.id,
  );
}

function checkLengthKind(run: SpoolRun, graph: SpoolGraph, issues: IssueSink): void {
  const kind = run.length.kind;
  if (kind !== 'centre-to-face' && kind !== 'face-to-face') return;
  const isFace = (id: string) => {
    const n = graph.nodes.get(id);
    return n?.kind === 'end' && (n.end.type === 'weld-neck-flange' || n.end.type === 'slip-on-flange');
  };
  const faces = Number(isFace(run.from)) + Number(isFace(run.to));
  if (kind === 'centre-to-face' && faces !== 1) {
    addWarning(
      issues,
      'length-kind-mismatch',
      `${runRef(run.id)} is dimensioned centre-to-face but ${faces === 0 ? 'neither end is' : 'both ends are'} a flange face`,
      run.id,
    );
  }
  if (kind === 'face-to-face' && faces !== 2) {
    addWarning(
      issues,
      'length-kind-mismatch',
      `${runRef(run.id)} is dimensioned face-to-face but only ${faces} of its ends is a flange face`,
      run.id,
    );
  }
}

function round(x: number): number {
  return Math.round(x * 10) / 10;
}

function round2(x: number): number {
  return Math.round(x * 100) / 100;
}
