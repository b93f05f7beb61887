import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Spool, SpoolStatusChange } from '../../../../shared/schemas/spool.schema';
import { apiRequest } from '../../../lib/api-client';
import { storeChangedSpool } from './spool-cache';

/** Moves a spool along the shop floor (cut, fitted, welded…), as the role allows. */
export function changeSpoolStatus(id: string, body: SpoolStatusChange): Promise<Spool> {
  return apiRequest<Spool>(`/spools/${encodeURIComponent(id)}/status`, { method: 'POST', body });
}

/** Status-change mutation. */
export function useChangeSpoolStatus(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SpoolStatusChange) => changeSpoolStatus(id, body),
    onSuccess: (spool) => storeChangedSpool(queryClient, spool),
  });
}
