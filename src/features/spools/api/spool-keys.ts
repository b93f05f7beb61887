import type { SpoolListParams } from './get-job-spools';

/**
 * Query keys for spools: all → lists → list(jobId, filters) → details → detail(id),
 * with each spool's revisions under its own branch so one invalidation reaches them.
 */
export const spoolKeys = {
  all: ['spools'] as const,
  lists: () => [...spoolKeys.all, 'list'] as const,
  listsOfJob: (jobId: string) => [...spoolKeys.lists(), jobId] as const,
  list: (jobId: string, params: SpoolListParams) => [...spoolKeys.listsOfJob(jobId), params] as const,
  details: () => [...spoolKeys.all, 'detail'] as const,
  detail: (id: string) => [...spoolKeys.details(), id] as const,
  revisions: (spoolId: string) => [...spoolKeys.detail(spoolId), 'revisions'] as const,
  revision: (spoolId: string, revisionId: string) => [...spoolKeys.revisions(spoolId), revisionId] as const,
};
