import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { apiRequest } from '../../../lib/api-client';
import { jobKeys } from '../../jobs/api/job-keys';
import { storeChangedSpool } from './spool-cache';

/** Archives a spool (kept with its revisions, out of the default list). */
export function archiveSpool(id: string, version?: number): Promise<Spool> {
  return apiRequest<Spool>(`/spools/${encodeURIComponent(id)}/archive`, { method: 'POST', body: version ? { version } : {} });
}

/** Archive-spool mutation; also refreshes the job's spool count. */
export function useArchiveSpool(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (version?: number) => archiveSpool(id, version),
    onSuccess: async (spool) => {
      await storeChangedSpool(queryClient, spool);
      await queryClient.invalidateQueries({ queryKey: jobKeys.detail(spool.jobId) });
    },
  });
}
