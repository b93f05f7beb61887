import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Job, JobCreate } from '../../../../shared/schemas/job.schema';
import { apiRequest } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

/** Creates a job in the signed-in user's shop. */
export function createJob(body: JobCreate): Promise<Job> {
  return apiRequest<Job>('/jobs', { method: 'POST', body });
}

/** Create-job mutation: seeds the new job's detail and refreshes every job list. */
export function useCreateJob() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createJob,
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(job.id), job);
      return queryClient.invalidateQueries({ queryKey: jobKeys.lists() });
    },
  });
}
