import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Spool, SpoolCreate } from '../../../../shared/schemas/spool.schema';
import { apiRequest } from '../../../lib/api-client';
import { jobKeys } from '../../jobs/api/job-keys';
import { spoolKeys } from './spool-keys';

/** Adds a spool to a job. */
export function createSpool(jobId: string, body: SpoolCreate): Promise<Spool> {
  return apiRequest<Spool>(`/jobs/${encodeURIComponent(jobId)}/spools`, { method: 'POST', body });
}

/** Create-spool mutation: refreshes the job's spool lists and its spool count. */
export function useCreateSpool(jobId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SpoolCreate) => createSpool(jobId, body),
    onSuccess: (spool) => {
      queryClient.setQueryData(spoolKeys.detail(spool.id), spool);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: spoolKeys.listsOfJob(jobId) }),
        queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) }),
        queryClient.invalidateQueries({ queryKey: jobKeys.lists() }),
      ]);
    },
  });
}
