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

// Nested maps keyed by each argument: a joined key string would be a fresh string to
// build and hash on every call.
const pipes = new Map<Nps, Map<Schedule, Lookup<PipeDimensions>>>();
const flanges = new Map<
  Nps,
  Map<FlangeClass, Map<FlangeType, Map<number | undefined, Lookup<FlangeDimensions>>>>
>();
let flangeEntries = 0;
const elbows = new Map<Nps, Map<ElbowKind, Lookup<ElbowDimensions>>>();
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
  let byKind = elbows.get(nps);
  if (!byKind) elbows.set(nps, (byKind = new Map()));
  let hit = byKind.get(kind);
  if (!hit) byKind.set(kind, (hit = elbowDimensions(nps, kind)));
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
  let bySchedule = pipes.get(nps);
  if (!bySchedule) pipes.set(nps, (bySchedule = new Map()));
  let hit = bySchedule.get(schedule);
  if (!hit) bySchedule.set(schedule, (hit = pipeDimensions(nps, schedule)));
  return hit;
}

/** {@link flangeDimensions}, memoised on size, class, type and pipe wall (mm). */
export function cachedFlangeDimensions(
  nps: Nps,
  cls: FlangeClass,
  type: FlangeType,
  pipeWallMm: number | undefined,
): Lookup<FlangeDimensions> {
  let byClass = flanges.get(nps);
  if (!byClass) flanges.set(nps, (byClass = new Map()));
  let byType = byClass.get(cls);
  if (!byType) byClass.set(cls, (byType = new Map()));
  let byWall = byType.get(type);
  if (!byWall) byType.set(type, (byWall = new Map()));
  let hit = byWall.get(pipeWallMm);
  if (!hit) {
    hit = flangeDimensions(nps, cls, type, pipeWallMm === undefined ? {} : { pipeWallMm });
    // Walls come from the pipe tables, so keys stay few; cap anyway.
    if (flangeEntries < 5000) {
      byWall.set(pipeWallMm, hit);
      flangeEntries++;
    }
  }
  return hit;
}
