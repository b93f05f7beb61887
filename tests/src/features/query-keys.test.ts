import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { jobKeys } from '../../../src/features/jobs/api/job-keys';
import { spoolKeys } from '../../../src/features/spools/api/spool-keys';
import { userKeys } from '../../../src/features/users/api/user-keys';

/** Seeds a cache with the given keys and returns which ones an invalidation of `prefix` marks stale. */
async function invalidated(keys: readonly (readonly unknown[])[], prefix: readonly unknown[]): Promise<string[]> {
  const client = new QueryClient();
  for (const key of keys) client.setQueryData(key, 1);
  await client.invalidateQueries({ queryKey: prefix, refetchType: 'none' });
  return client
    .getQueryCache()
    .findAll({ stale: true })
    .filter((q) => q.state.isInvalidated)
    .map((q) => JSON.stringify(q.queryKey))
    .sort();
}

describe('query key factories', () => {
  it('invalidating job lists reaches every filtered list but no job detail', async () => {
    const keys = [jobKeys.list({ page: 1 }), jobKeys.list({ page: 2, q: 'kps' }), jobKeys.detail('j1')];
    expect(await invalidated(keys, jobKeys.lists())).toEqual(
      [JSON.stringify(jobKeys.list({ page: 1 })), JSON.stringify(jobKeys.list({ page: 2, q: 'kps' }))].sort(),
    );
  });

  it('invalidating one job’s spool lists leaves other jobs’ lists alone', async () => {
    const mine = spoolKeys.list('j1', { sort: 'mark' });
    const other = spoolKeys.list('j2', { sort: 'mark' });
    expect(await invalidated([mine, other], spoolKeys.listsOfJob('j1'))).toEqual([JSON.stringify(mine)]);
  });

  it('a spool detail invalidation also refreshes its revisions', async () => {
    const keys = [spoolKeys.detail('s1'), spoolKeys.revisions('s1'), spoolKeys.revision('s1', 'r1'), spoolKeys.detail('s2')];
    expect(await invalidated(keys, spoolKeys.detail('s1'))).toEqual(
      [spoolKeys.detail('s1'), spoolKeys.revisions('s1'), spoolKeys.revision('s1', 'r1')].map((k) => JSON.stringify(k)).sort(),
    );
  });

  it('resources never share a root key', () => {
    expect(new Set([jobKeys.all[0], spoolKeys.all[0], userKeys.all[0]]).size).toBe(3);
  });
});
