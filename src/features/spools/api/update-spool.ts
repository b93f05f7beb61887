import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Spool, SpoolUpdate } from '../../../../shared/schemas/spool.schema';
import { apiRequest } from '../../../lib/api-client';
import { storeChangedSpool } from './spool-cache';

/** Renames a spool or changes its line number; `version` guards against stale edits. */
export function updateSpool(id: string, body: SpoolUpdate): Promise<Spool> {
  return apiRequest<Spool>(`/spools/${encodeURIComponent(id)}`, { method: 'PATCH', body });
}

/** Update-spool mutation. */
export function useUpdateSpool(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SpoolUpdate) => updateSpool(id, body),
    onSuccess: (spool) => storeChangedSpool(queryClient, spool),
  });
}
