import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { apiRequest } from '../../../lib/api-client';
import { spoolKeys } from './spool-keys';

/** One spool. */
export function getSpool(id: string, signal?: AbortSignal): Promise<Spool> {
  return apiRequest<Spool>(`/spools/${encodeURIComponent(id)}`, { signal });
}

export const spoolQueryOptions = (id: string) =>
  queryOptions({ queryKey: spoolKeys.detail(id), queryFn: ({ signal }) => getSpool(id, signal) });

/** A spool by id. */
export function useSpool(id: string) {
  return useQuery(spoolQueryOptions(id));
}
