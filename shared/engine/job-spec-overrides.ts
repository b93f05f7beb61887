import type { Job } from '../schemas/job.schema';
import type { SpecOverrides } from '../schemas/spool-design-spec.schema';
import { scheduleSchema } from '../standards/pipe-schedules';

/**
 * A job's default spec as engine overrides: the one translation the editor, the sheets and
 * the revision service all use. Values the design tables do not carry (a schedule or class
 * without data) are left to the design and built-in defaults, so the engine never sees an
 * unknown value.
 */
export function jobSpecOverrides(spec: Job['spec'] | undefined): SpecOverrides {
  if (!spec) return {};
  const schedule = scheduleSchema.safeParse(spec.schedule);
  return {
    material: spec.material,
    ...(schedule.success ? { schedule: schedule.data } : {}),
    ...(spec.flangeClass === 150 || spec.flangeClass === 300 ? { flangeClass: spec.flangeClass } : {}),
    rootGapMm: spec.rootGapMm,
    sawKerfMm: spec.sawKerfMm,
    minPieceLengthMm: spec.minPieceLengthMm,
  };
}
