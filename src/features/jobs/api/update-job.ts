import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Job, JobUpdate } from '../../../../shared/schemas/job.schema';
import { apiRequest } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

/** Changes a job; `version` is the one last read (409 when someone saved since). */
export function updateJob(id: string, body: JobUpdate): Promise<Job> {
  return apiRequest<Job>(`/jobs/${encodeURIComponent(id)}`, { method: 'PATCH', body });
}

/** Update-job mutation for one job. */
export function useUpdateJob(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: JobUpdate) => updateJob(id, body),
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(id), job);
      return queryClient.invalidateQueries({ queryKey: jobKeys.lists() });
    },
  });
}
