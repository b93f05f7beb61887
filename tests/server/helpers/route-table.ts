import type { DataSource } from 'typeorm';
import type { Role } from '../../../shared/schemas/role.schema';
import type { SpoolStatus } from '../../../shared/schemas/spool-status.schema';
import { SpoolEntity } from '../../../server/modules/spools/spool.entity';
import { createJob, createSpool, createUser, PASSWORD, SPEC, type Shop } from './fixtures';

/** One API route, with what a call needs: its records (fresh per call) and its body. */
export interface RouteCase {
  name: string;
  method: 'get' | 'post' | 'patch' | 'put';
  /** Roles the contract lets through; everyone else must get 403. `public`: no sign-in needed. */
  allowed: Role[] | 'public';
  /** Creates the records the call touches in `shop` and returns the path and body. */
  prepare(ds: DataSource, shop: Shop, role: Role): Promise<{ path: string; body?: unknown }>;
}

const ALL: Role[] = ['admin', 'detailer', 'fabricator', 'inspector', 'viewer'];
const WRITERS: Role[] = ['admin', 'detailer'];

/** A status move each role that may call the status route is allowed to make. */
const STATUS_MOVE: Partial<Record<Role, [SpoolStatus, SpoolStatus]>> = {
  admin: ['issued', 'cut'],
  fabricator: ['issued', 'cut'],
  inspector: ['welded', 'inspected'],
};

async function jobAndSpool(ds: DataSource, shop: Shop, status?: SpoolStatus) {
  const job = await createJob(ds, shop);
  const { spool, draft } = await createSpool(ds, shop, job, status ? { status } : {});
  return { job, spool, draft };
}

/** Every route of the API (sign-in and sign-out are covered in auth.test.ts). */
export const ROUTES: RouteCase[] = [
  {
    name: 'GET /api/health',
    method: 'get',
    allowed: 'public',
    prepare: async () => ({ path: '/api/health' }),
  },
  { name: 'GET /api/auth/me', method: 'get', allowed: ALL, prepare: async () => ({ path: '/api/auth/me' }) },
  {
    name: 'GET /api/users',
    method: 'get',
    allowed: ['admin'],
    prepare: async () => ({ path: '/api/users' }),
  },
  {
    name: 'POST /api/users',
    method: 'post',
    allowed: ['admin'],
    prepare: async (_ds, shop, role) => ({
      path: '/api/users',
      body: {
        email: `new-${role}-${Math.random().toString(36).slice(2)}@${shop.slug}.example`,
        displayName: 'New Person',
        role: 'viewer',
        password: 'a-long-password',
        currentPassword: PASSWORD,
      },
    }),
  },
  {
    name: 'GET /api/users/:id',
    method: 'get',
    allowed: ['admin'],
    prepare: async (_ds, shop) => ({ path: `/api/users/${shop.users.viewer.id}` }),
  },
  {
    name: 'PATCH /api/users/:id',
    method: 'patch',
    allowed: ['admin'],
    prepare: async (ds, shop) => {
      const user = await createUser(ds, shop, 'viewer');
      return {
        path: `/api/users/${user.id}`,
        body: { displayName: 'Renamed', role: 'inspector', currentPassword: PASSWORD },
      };
    },
  },
  {
    name: 'POST /api/users/:id/reset-password',
    method: 'post',
    allowed: ['admin'],
    prepare: async (ds, shop) => {
      const user = await createUser(ds, shop, 'viewer');
      return {
        path: `/api/users/${user.id}/reset-password`,
        body: { password: 'another-long-password', currentPassword: PASSWORD },
      };
    },
  },
  {
    name: 'GET /api/audit-events',
    method: 'get',
    allowed: ['admin'],
    prepare: async () => ({ path: '/api/audit-events' }),
  },
  { name: 'GET /api/jobs', method: 'get', allowed: ALL, prepare: async () => ({ path: '/api/jobs' }) },
  {
    name: 'POST /api/jobs',
    method: 'post',
    allowed: WRITERS,
    prepare: async () => ({
      path: '/api/jobs',
      body: {
        number: `N-${Math.random().toString(36).slice(2, 10)}`,
        title: 'Title',
        client: 'Client',
        spec: SPEC,
      },
    }),
  },
  {
    name: 'GET /api/jobs/:id',
    method: 'get',
    allowed: ALL,
    prepare: async (ds, shop) => ({ path: `/api/jobs/${(await createJob(ds, shop)).id}` }),
  },
  {
    name: 'PATCH /api/jobs/:id',
    method: 'patch',
    allowed: WRITERS,
    prepare: async (ds, shop) => ({
      path: `/api/jobs/${(await createJob(ds, shop)).id}`,
      body: { title: 'Changed title', version: 1 },
    }),
  },
  {
    name: 'POST /api/jobs/:id/archive',
    method: 'post',
    allowed: WRITERS,
    prepare: async (ds, shop) => ({ path: `/api/jobs/${(await createJob(ds, shop)).id}/archive` }),
  },
  {
    name: 'GET /api/jobs/:jobId/spools',
    method: 'get',
    allowed: ALL,
    prepare: async (ds, shop) => ({ path: `/api/jobs/${(await jobAndSpool(ds, shop)).job.id}/spools` }),
  },
  {
    name: 'POST /api/jobs/:jobId/spools',
    method: 'post',
    allowed: WRITERS,
    prepare: async (ds, shop) => ({
      path: `/api/jobs/${(await createJob(ds, shop)).id}/spools`,
      body: { mark: 'CW-999-S01', lineNumber: 'CW-999' },
    }),
  },
  {
    name: 'GET /api/spools/:id',
    method: 'get',
    allowed: ALL,
    prepare: async (ds, shop) => ({ path: `/api/spools/${(await jobAndSpool(ds, shop)).spool.id}` }),
  },
  {
    name: 'PATCH /api/spools/:id',
    method: 'patch',
    allowed: WRITERS,
    prepare: async (ds, shop) => ({
      path: `/api/spools/${(await jobAndSpool(ds, shop)).spool.id}`,
      body: { lineNumber: 'CW-777', version: 1 },
    }),
  },
  {
    name: 'POST /api/spools/:id/status',
    method: 'post',
    allowed: ['admin', 'fabricator', 'inspector'],
    prepare: async (ds, shop, role) => {
      const [from, to] = STATUS_MOVE[role] ?? ['issued', 'cut'];
      const { spool } = await jobAndSpool(ds, shop, from);
      return { path: `/api/spools/${spool.id}/status`, body: { status: to, version: 1 } };
    },
  },
  {
    name: 'POST /api/spools/:id/rework/done',
    method: 'post',
    allowed: ['admin', 'fabricator'],
    prepare: async (ds, shop) => {
      const { spool } = await jobAndSpool(ds, shop, 'issued');
      await ds.getRepository(SpoolEntity).update(
        { id: spool.id },
        {
          rework: {
            letter: 'B',
            sinceLetter: 'A',
            fromStatus: 'welded',
            toStatus: 'issued',
            changes: ['P1: cut length was 100.0 mm, now 200.0 mm.'],
            flaggedAt: new Date().toISOString(),
          },
        },
      );
      return { path: `/api/spools/${spool.id}/rework/done`, body: { version: 1 } };
    },
  },
  {
    name: 'POST /api/spools/:id/archive',
    method: 'post',
    allowed: WRITERS,
    prepare: async (ds, shop) => ({ path: `/api/spools/${(await jobAndSpool(ds, shop)).spool.id}/archive` }),
  },
  {
    name: 'GET /api/spools/:id/revisions',
    method: 'get',
    allowed: ALL,
    prepare: async (ds, shop) => ({
      path: `/api/spools/${(await jobAndSpool(ds, shop)).spool.id}/revisions`,
    }),
  },
  {
    name: 'GET /api/spools/:id/revisions/:revisionId',
    method: 'get',
    allowed: ALL,
    prepare: async (ds, shop) => {
      const { spool, draft } = await jobAndSpool(ds, shop);
      return { path: `/api/spools/${spool.id}/revisions/${draft.id}` };
    },
  },
  {
    name: 'POST /api/spools/:id/draft',
    method: 'post',
    allowed: WRITERS,
    prepare: async (ds, shop) => ({ path: `/api/spools/${(await jobAndSpool(ds, shop)).spool.id}/draft` }),
  },
  {
    name: 'PUT /api/spools/:id/draft',
    method: 'put',
    allowed: WRITERS,
    prepare: async (ds, shop) => {
      const { spool, draft } = await jobAndSpool(ds, shop);
      return {
        path: `/api/spools/${spool.id}/draft`,
        body: { design: draft.design, note: 'Edited', version: 1 },
      };
    },
  },
  {
    name: 'POST /api/spools/:id/draft/issue',
    method: 'post',
    allowed: WRITERS,
    prepare: async (ds, shop) => ({
      path: `/api/spools/${(await jobAndSpool(ds, shop)).spool.id}/draft/issue`,
      body: { note: 'For fabrication' },
    }),
  },
  {
    name: 'GET /api/spools/:id/sheet.pdf',
    method: 'get',
    allowed: ALL,
    prepare: async (ds, shop) => ({
      path: `/api/spools/${(await jobAndSpool(ds, shop)).spool.id}/sheet.pdf`,
    }),
  },
  {
    name: 'GET /api/jobs/:id/saw-list.pdf',
    method: 'get',
    allowed: ALL,
    prepare: async (ds, shop) => ({ path: `/api/jobs/${(await jobAndSpool(ds, shop)).job.id}/saw-list.pdf` }),
  },
];
