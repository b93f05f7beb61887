import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page } from '../../../../shared/schemas/list-query.schema';
import type { Spool, SPOOL_SORT_FIELDS } from '../../../../shared/schemas/spool.schema';
import type { SpoolStatus } from '../../../../shared/schemas/spool-status.schema';
import { apiRequest } from '../../../lib/api-client';
import type { ListParams } from '../../../lib/list-params';
import { spoolKeys } from './spool-keys';

/** Query-string parameters of a job's spool list. */
export interface SpoolListParams extends ListParams<(typeof SPOOL_SORT_FIELDS)[number]> {
  status?: SpoolStatus;
  includeArchived?: boolean;
}

/** One page of a job's spools. */
export function getJobSpools(jobId: string, params: SpoolListParams, signal?: AbortSignal): Promise<Page<Spool>> {
  return apiRequest<Page<Spool>>(`/jobs/${encodeURIComponent(jobId)}/spools`, { query: params, signal });
}

export const jobSpoolsQueryOptions = (jobId: string, params: SpoolListParams) =>
  queryOptions({
    queryKey: spoolKeys.list(jobId, params),
    queryFn: ({ signal }) => getJobSpools(jobId, params, signal),
    placeholderData: keepPreviousData,
  });

/** A job's spools, sorted and paged as asked. */
export function useJobSpools(jobId: string, params: SpoolListParams) {
  return useQuery(jobSpoolsQueryOptions(jobId, params));
}
