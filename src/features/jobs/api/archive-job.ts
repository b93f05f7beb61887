import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Job } from '../../../../shared/schemas/job.schema';
import { apiRequest } from '../../../lib/api-client';
import { jobKeys } from './job-keys';

/** Archives a job (it leaves the default lists; nothing is deleted). */
export function archiveJob(id: string, version?: number): Promise<Job> {
  return apiRequest<Job>(`/jobs/${encodeURIComponent(id)}/archive`, { method: 'POST', body: version ? { version } : {} });
}

/** Archive-job mutation. */
export function useArchiveJob(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (version?: number) => archiveJob(id, version),
    onSuccess: (job) => {
      queryClient.setQueryData(jobKeys.detail(id), job);
      return queryClient.invalidateQueries({ queryKey: jobKeys.lists() });
    },
  });
}
