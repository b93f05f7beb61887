import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import type { Role } from '../../../shared/schemas/role.schema';
import type { SpoolStatus } from '../../../shared/schemas/spool-status.schema';
import { JobEntity, type JobRow } from '../../../server/modules/jobs/job.entity';
import { OrganisationEntity } from '../../../server/modules/organisations/organisation.entity';
import {
  SpoolRevisionEntity,
  type SpoolRevisionRow,
} from '../../../server/modules/revisions/spool-revision.entity';
import { starterDesign } from '../../../server/modules/revisions/starter-design';
import { SpoolEntity, type SpoolRow } from '../../../server/modules/spools/spool.entity';
import { UserEntity, type UserRow } from '../../../server/modules/users/user.entity';

/** Password of every fixture account. */
export const PASSWORD = 'fixture-password-1';
const HASH = bcrypt.hashSync(PASSWORD, 4);
export const ROLES: Role[] = ['admin', 'detailer', 'fabricator', 'inspector', 'viewer'];

/** A job spec that passes jobSpecSchema. */
export const SPEC = {
  material: 'ASTM A106 Gr B',
  schedule: 'STD',
  flangeClass: 150,
  rootGapMm: 3,
  sawKerfMm: 3,
  minPieceLengthMm: 100,
} as const;

/** One test shop: an organisation with one user per role. */
export interface Shop {
  id: string;
  slug: string;
  name: string;
  users: Record<Role, UserRow>;
  email(role: Role): string;
}

let counter = 0;
const unique = () => `${Date.now().toString(36)}${(counter++).toString(36)}`;

/** Creates an organisation with one active user per role (password {@link PASSWORD}). */
export async function createShop(ds: DataSource, label: string): Promise<Shop> {
  const slug = `${label}-${unique()}`.toLowerCase();
  const org = await ds.getRepository(OrganisationEntity).save({ slug, name: `${label} Test Shop` });
  const users = {} as Record<Role, UserRow>;
  for (const role of ROLES) {
    users[role] = await ds.getRepository(UserEntity).save({
      organisationId: org.id,
      email: `${role}@${slug}.example`,
      displayName: `${label} ${role}`,
      role,
      passwordHash: HASH,
      active: true,
    });
  }
  return { id: org.id, slug, name: org.name, users, email: (role) => users[role].email };
}

/** Creates a user in `shop` with the given role (and active flag). */
export async function createUser(ds: DataSource, shop: Shop, role: Role, active = true): Promise<UserRow> {
  const tag = unique();
  return ds.getRepository(UserEntity).save({
    organisationId: shop.id,
    email: `${role}-${tag}@${shop.slug}.example`,
    displayName: `Extra ${role} ${tag}`,
    role,
    passwordHash: HASH,
    active,
  });
}

/** Creates a job in `shop`. */
export async function createJob(ds: DataSource, shop: Shop, fields: Partial<JobRow> = {}): Promise<JobRow> {
  return ds.getRepository(JobEntity).save({
    organisationId: shop.id,
    number: `J-${unique()}`,
    title: 'Chilled water, Level 2',
    client: 'Invented Client Ltd',
    site: 'Level 2',
    units: 'mm',
    spec: { ...SPEC },
    status: 'active',
    ...fields,
  });
}

/** A spool with its draft revision A (starter design). */
export interface SpoolFixture {
  spool: SpoolRow;
  draft: SpoolRevisionRow;
}

/** Creates a spool in `job` with a draft revision A, optionally in a given status. */
export async function createSpool(
  ds: DataSource,
  shop: Shop,
  job: JobRow,
  fields: { status?: SpoolStatus; mark?: string } = {},
): Promise<SpoolFixture> {
  const mark = fields.mark ?? `SP-${unique()}`;
  const spool = await ds.getRepository(SpoolEntity).save({
    organisationId: shop.id,
    jobId: job.id,
    mark,
    lineNumber: 'CW-100',
    status: fields.status ?? 'drafting',
  });
  const draft = await ds.getRepository(SpoolRevisionEntity).save({
    organisationId: shop.id,
    spoolId: spool.id,
    letter: 'A',
    state: 'draft',
    design: starterDesign({ mark, lineNumber: 'CW-100' }),
    note: '',
    authorId: shop.users.detailer.id,
  });
  return { spool, draft };
}

/**
 * Every row of every application table (sessions aside), sorted, as JSON: equal
 * before and after a refused request means nothing was written.
 */
export async function snapshot(ds: DataSource): Promise<string> {
  const tables = ['organisation', 'app_user', 'job', 'spool', 'spool_revision', 'audit_event'];
  const out: Record<string, unknown> = {};
  for (const t of tables) out[t] = await ds.query(`SELECT * FROM ${t} ORDER BY id`);
  return JSON.stringify(out);
}

/** Number of audit events, optionally of one action. */
export async function auditCount(ds: DataSource, action?: string): Promise<number> {
  const rows: Array<{ n: number }> = action
    ? await ds.query(`SELECT count(*)::int AS n FROM audit_event WHERE action = $1`, [action])
    : await ds.query(`SELECT count(*)::int AS n FROM audit_event`);
  return rows[0]!.n;
}
