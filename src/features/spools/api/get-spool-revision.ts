import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Revision } from '../../../../shared/schemas/revision.schema';
import { apiRequest } from '../../../lib/api-client';
import { spoolKeys } from './spool-keys';

/** One revision with its design document. */
export function getSpoolRevision(spoolId: string, revisionId: string, signal?: AbortSignal): Promise<Revision> {
  return apiRequest<Revision>(
    `/spools/${encodeURIComponent(spoolId)}/revisions/${encodeURIComponent(revisionId)}`,
    { signal },
  );
}

export const spoolRevisionQueryOptions = (spoolId: string, revisionId: string) =>
  queryOptions({
    queryKey: spoolKeys.revision(spoolId, revisionId),
    queryFn: ({ signal }) => getSpoolRevision(spoolId, revisionId, signal),
  });

/** A revision of a spool, with its design. */
export function useSpoolRevision(spoolId: string, revisionId: string | null) {
  return useQuery({ ...spoolRevisionQueryOptions(spoolId, revisionId ?? ''), enabled: Boolean(revisionId) });
}
