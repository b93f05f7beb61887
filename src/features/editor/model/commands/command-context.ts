import type { SpoolResult } from '../../../../../shared/engine/compute-result';
import type { IdAllocator } from '../id-allocator';

/**
 * What a command may read besides the design: the engine's result for that design (for
 * derived distances, e.g. the work-point distance of a run stated as a cut length) and
 * the id allocator.
 */
export type CommandContext = {
  result: SpoolResult | null;
  ids: IdAllocator;
};
