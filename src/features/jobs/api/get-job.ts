import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Job } from '../../../../shared/schemas/job.schema';
import { apiRequest } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

/** One job with its spec. */
export function getJob(id: string, signal?: AbortSignal): Promise<Job> {
  return apiRequest<Job>(`/jobs/${encodeURIComponent(id)}`, { signal });
}

export const jobQueryOptions = (id: string) =>
  queryOptions({ queryKey: jobKeys.detail(id), queryFn: ({ signal }) => getJob(id, signal) });

/** A job by id; waits while the id is still unknown (empty). */
export function useJob(id: string) {
  return useQuery({ ...jobQueryOptions(id), enabled: id !== '' });
}
