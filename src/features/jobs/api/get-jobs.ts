import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Job, JobStatus, JOB_SORT_FIELDS } from '../../../../shared/schemas/job.schema';
import type { Page } from '../../../../shared/schemas/list-query.schema';
import { apiRequest } from '../../../lib/api-client';
import type { ListParams } from '../../../lib/list-params';
import { jobKeys } from './job-keys';

/** Query-string parameters of the job list (before the server's defaults). */
export interface JobListParams extends ListParams<(typeof JOB_SORT_FIELDS)[number]> {
  status?: JobStatus;
  includeArchived?: boolean;
}

/** One page of the shop's jobs. */
export function getJobs(params: JobListParams, signal?: AbortSignal): Promise<Page<Job>> {
  return apiRequest<Page<Job>>('/jobs', { query: params, signal });
}

export const jobsQueryOptions = (params: JobListParams) =>
  queryOptions({
    queryKey: jobKeys.list(params),
    queryFn: ({ signal }) => getJobs(params, signal),
    placeholderData: keepPreviousData,
  });

/** The job list; keeps the previous page on screen while the next one loads. */
export function useJobs(params: JobListParams) {
  return useQuery(jobsQueryOptions(params));
}
