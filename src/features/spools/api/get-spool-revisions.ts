import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RevisionSummary } from '../../../../shared/schemas/revision.schema';
import { apiRequest } from '../../../lib/api-client';
import { spoolKeys } from './spool-keys';

/** A spool's revisions, newest first, without their designs. */
export async function getSpoolRevisions(spoolId: string, signal?: AbortSignal): Promise<RevisionSummary[]> {
  const res = await apiRequest<RevisionSummary[] | { items: RevisionSummary[] }>(
    `/spools/${encodeURIComponent(spoolId)}/revisions`,
    { signal },
  );
  // The list may come bare or paged; the screen wants the rows either way.
  return Array.isArray(res) ? res : res.items;
}

export const spoolRevisionsQueryOptions = (spoolId: string) =>
  queryOptions({
    queryKey: spoolKeys.revisions(spoolId),
    queryFn: ({ signal }) => getSpoolRevisions(spoolId, signal),
  });

/** The revision list of a spool. */
export function useSpoolRevisions(spoolId: string) {
  return useQuery(spoolRevisionsQueryOptions(spoolId));
}
