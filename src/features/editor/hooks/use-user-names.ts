import { useMemo } from 'react';
import type { SpoolResult } from '../../../../shared/engine/compute-result';
import type { SpoolDesign } from '../../../../shared/schemas/spool-design.schema';
import { userNames, type UserNames } from '../model/user-names';

/** Shop-mark names for the ids of `design`, recomputed when the result or design changes. */
export function useUserNames(result: SpoolResult | null, design: SpoolDesign | null): UserNames {
  return useMemo(() => userNames(result, design), [result, design]);
}
