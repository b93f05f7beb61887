import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { AuditEventEntity } from '../modules/audit/audit-event.entity';
import { JobEntity } from '../modules/jobs/job.entity';
import { OrganisationEntity } from '../modules/organisations/organisation.entity';
import { SpoolRevisionEntity } from '../modules/revisions/spool-revision.entity';
import { SpoolEntity } from '../modules/spools/spool.entity';
import { UserEntity } from '../modules/users/user.entity';
import { InitialSchema1764626400000 } from './migrations/1764626400000-initial-schema';
import { SpoolRework1764800000000 } from './migrations/1764800000000-spool-rework';
import { SignInFailures1764900000000 } from './migrations/1764900000000-sign-in-failures';
import { SignInFailureEntity } from '../modules/auth/sign-in-failure.entity';

/** Every entity, listed (not globbed) so tsx and the bundler both find them. */
export const ENTITIES = [
  OrganisationEntity,
  UserEntity,
  JobEntity,
  SpoolEntity,
  SpoolRevisionEntity,
  AuditEventEntity,
  SignInFailureEntity,
];
/** Every migration in order. Add new ones at the end. */
export const MIGRATIONS = [InitialSchema1764626400000, SpoolRework1764800000000, SignInFailures1764900000000];

/** A DataSource on `url`. Schema changes only through migrations, never synchronize. */
export function createDataSource(url: string, options: { poolSize?: number } = {}): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'typeorm_migrations',
    synchronize: false,
    // Expected failures (duplicates) are answered as 409s; 500s are logged by the error middleware.
    logging: ['migration'],
    extra: { max: options.poolSize ?? 10, connectionTimeoutMillis: 5000 },
  });
}
