import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Revision } from '../../../../shared/schemas/revision.schema';
import { apiRequest } from '../../../lib/api-client';
import { spoolKeys } from './spool-keys';

/** Opens the spool's working draft (a copy of the latest issued design), or returns the one already open. */
export function createDraft(spoolId: string): Promise<Revision> {
  return apiRequest<Revision>(`/spools/${encodeURIComponent(spoolId)}/draft`, { method: 'POST', body: {} });
}

/** Start-draft mutation: refreshes the spool (its draft pointer) and its revisions. */
export function useCreateDraft(spoolId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => createDraft(spoolId),
    onSuccess: (revision) => {
      queryClient.setQueryData(spoolKeys.revision(spoolId, revision.id), revision);
      return queryClient.invalidateQueries({ queryKey: spoolKeys.detail(spoolId) });
    },
  });
}
