import type { QueryClient } from '@tanstack/react-query';
import type { Spool } from '../../../../shared/schemas/spool.schema';
import { spoolKeys } from './spool-keys';

/** After any change to one spool: store the answer and refresh the lists that show it. */
export function storeChangedSpool(queryClient: QueryClient, spool: Spool): Promise<void> {
  queryClient.setQueryData(spoolKeys.detail(spool.id), spool);
  return queryClient.invalidateQueries({ queryKey: spoolKeys.listsOfJob(spool.jobId) });
}
