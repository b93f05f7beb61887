import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DraftSave, Revision } from '../../../../shared/schemas/revision.schema';
import { apiRequest } from '../../../lib/api-client';
import { spoolKeys } from './spool-keys';

/** Saves the whole draft design; 409 (ApiError.isStale) when someone saved since `version`, nothing written. */
export function saveDraft(spoolId: string, body: DraftSave): Promise<Revision> {
  return apiRequest<Revision>(`/spools/${encodeURIComponent(spoolId)}/draft`, { method: 'PUT', body });
}

/** Save-draft mutation. On 409 the caller keeps its unsaved design and offers a reload. */
export function useSaveDraft(spoolId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: DraftSave) => saveDraft(spoolId, body),
    onSuccess: (revision) => {
      queryClient.setQueryData(spoolKeys.revision(spoolId, revision.id), revision);
      return queryClient.invalidateQueries({ queryKey: spoolKeys.detail(spoolId), exact: true });
    },
  });
}
