/**
 * Memoised standards lookups for the engine's hot path (the editor recomputes on every
 * keystroke). The tables are static and the lookups pure, so a result can be shared;
 * callers must treat returned values as read-only.
 */
import {
  flangeDimensions,
  type FlangeClass,
  type FlangeDimensions,
  type FlangeType,
} from '../standards/flanges';
import type { Lookup } from '../standards/lookup-result';
import type { Nps } from '../standards/nps';
import { elbowDimensions, type ElbowDimensions, type ElbowKind } from '../standards/butt-weld-fittings';
import {
  pipeDimensions,
  pipeOdMm,
  scheduleLabel,
  type PipeDimensions,
  type Schedule,
} from '../standards/pipe-schedules';

const pipes = new Map<string, Lookup<PipeDimensions>>();
const flanges = new Map<string, Lookup<FlangeDimensions>>();
const elbows = new Map<string, Lookup<ElbowDimensions>>();
const labels = new Map<Schedule, string>();
const ods = new Map<Nps, number | null>();

/** Pipe outside diameter for a size (ASME B36.10M), mm, memoised; null when not tabulated. */
export function cachedPipeOdMm(nps: Nps): number | null {
  const hit = ods.get(nps);
  if (hit !== undefined) return hit;
  const l = pipeOdMm(nps);
  const od = l.ok ? l.value.odMm : null;
  ods.set(nps, od);
  return od;
}

/** {@link elbowDimensions}, memoised. */
export function cachedElbowDimensions(nps: Nps, kind: ElbowKind): Lookup<ElbowDimensions> {
  const key = `${nps}|${kind}`;
  let hit = elbows.get(key);
  if (!hit) elbows.set(key, (hit = elbowDimensions(nps, kind)));
  return hit;
}

/** {@link scheduleLabel}, memoised ("Sch 40", "STD"). */
export function cachedScheduleLabel(schedule: Schedule): string {
  let hit = labels.get(schedule);
  if (hit === undefined) labels.set(schedule, (hit = scheduleLabel(schedule)));
  return hit;
}

/** {@link pipeDimensions}, memoised. */
export function cachedPipeDimensions(nps: Nps, schedule: Schedule): Lookup<PipeDimensions> {
  const key = `${nps}|${schedule}`;
  let hit = pipes.get(key);
  if (!hit) pipes.set(key, (hit = pipeDimensions(nps, schedule)));
  return hit;
}

/** {@link flangeDimensions}, memoised on size, class, type and pipe wall (mm). */
export function cachedFlangeDimensions(
  nps: Nps,
  cls: FlangeClass,
  type: FlangeType,
  pipeWallMm: number | undefined,
): Lookup<FlangeDimensions> {
  const key = `${nps}|${cls}|${type}|${pipeWallMm ?? ''}`;
  let hit = flanges.get(key);
  if (!hit) {
    hit = flangeDimensions(nps, cls, type, pipeWallMm === undefined ? {} : { pipeWallMm });
    // Walls come from the pipe tables, so keys stay few; cap anyway.
    if (flanges.size < 5000) flanges.set(key, hit);
  }
  return hit;
}
