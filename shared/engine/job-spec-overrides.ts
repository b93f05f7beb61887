import type { Job } from '../schemas/job.schema';
import type { SpecOverrides } from '../schemas/spool-design-spec.schema';
import { scheduleSchema } from '../standards/pipe-schedules';

/**
 * A job's default spec as engine overrides: the one translation the editor, the sheets and
 * the revision service all use. A schedule the pipe tables do not carry is left to the
 * design and built-in defaults; the flange class is passed on as stored, never swapped for
 * another (the engine refuses a class without a table).
 */
export function jobSpecOverrides(spec: Job['spec'] | undefined): SpecOverrides {
  if (!spec) return {};
  const schedule = scheduleSchema.safeParse(spec.schedule);
  return {
    material: spec.material,
    ...(schedule.success ? { schedule: schedule.data } : {}),
    flangeClass: spec.flangeClass,
    ...(spec.gasketType ? { gasketType: spec.gasketType } : {}),
    ...(spec.boltingMaterial ? { boltingMaterial: spec.boltingMaterial } : {}),
    rootGapMm: spec.rootGapMm,
    sawKerfMm: spec.sawKerfMm,
    minPieceLengthMm: spec.minPieceLengthMm,
  };
}
