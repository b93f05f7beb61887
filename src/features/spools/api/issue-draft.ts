import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DraftIssue, Revision } from '../../../../shared/schemas/revision.schema';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { apiRequest } from '../../../lib/api-client';
import { spoolKeys } from './spool-keys';

/** Issues the working draft as the next revision letter; the previous issued one becomes superseded. */
export function issueDraft(spoolId: string, body: DraftIssue): Promise<Revision> {
  return apiRequest<Revision>(`/spools/${encodeURIComponent(spoolId)}/draft/issue`, { method: 'POST', body });
}

/** Issue mutation: refreshes the spool, its revisions and the job's spool lists (status moves to issued). */
export function useIssueDraft(spoolId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: DraftIssue) => issueDraft(spoolId, body),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: spoolKeys.detail(spoolId) });
      const spool = queryClient.getQueryData<Spool>(spoolKeys.detail(spoolId));
      if (spool) await queryClient.invalidateQueries({ queryKey: spoolKeys.listsOfJob(spool.jobId) });
    },
  });
}
