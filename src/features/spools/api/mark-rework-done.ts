import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReworkDone, Spool } from '../../../../shared/schemas/spool.schema';
import { apiRequest } from '../../../lib/api-client';
import { storeChangedSpool } from './spool-cache';

/** The bay says the spool has been reworked to its current revision: the flag clears. */
export function markReworkDone(id: string, body: ReworkDone): Promise<Spool> {
  return apiRequest<Spool>(`/spools/${encodeURIComponent(id)}/rework/done`, { method: 'POST', body });
}

/** Rework-done mutation. */
export function useMarkReworkDone(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ReworkDone) => markReworkDone(id, body),
    onSuccess: (spool) => storeChangedSpool(queryClient, spool),
  });
}
