import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { DataSource, EntityManager } from 'typeorm';
import { spoolDesignSchema } from '../../../shared/schemas/spool-design.schema';
import { writeAuditEvent } from '../../modules/audit/audit.service';
import { hashPassword } from '../../modules/auth/password';
import { JobEntity } from '../../modules/jobs/job.entity';
import { OrganisationEntity } from '../../modules/organisations/organisation.entity';
import { SpoolRevisionEntity } from '../../modules/revisions/spool-revision.entity';
import { starterDesign } from '../../modules/revisions/starter-design';
import { SpoolEntity } from '../../modules/spools/spool.entity';
import { UserEntity } from '../../modules/users/user.entity';
import { DEMO_ORGANISATIONS, DEMO_PASSWORD, type DemoOrganisation, type DemoSpool } from './demo-data';

/** What one seed run added. A second run adds nothing. */
export interface SeedReport {
  organisations: number;
  users: number;
  jobs: number;
  spools: number;
  revisions: number;
  warnings: string[];
}

/**
 * Loads the demo scenario idempotently, keyed on natural keys (organisation slug,
 * user e-mail, job number, spool mark). A record that exists is left exactly as it
 * is, so whatever users changed survives a re-seed. One transaction: all or nothing.
 */
export async function seedDemo(
  ds: DataSource,
  options: { samplesDir: string; bcryptCost?: number; organisations?: DemoOrganisation[] },
): Promise<SeedReport> {
  const report: SeedReport = { organisations: 0, users: 0, jobs: 0, spools: 0, revisions: 0, warnings: [] };
  const passwordHash = await hashPassword(DEMO_PASSWORD, options.bcryptCost ?? 10);
  await ds.transaction(async (m) => {
    for (const demo of options.organisations ?? DEMO_ORGANISATIONS) {
      await seedOrganisation(m, demo, passwordHash, options.samplesDir, report);
    }
  });
  return report;
}

async function seedOrganisation(
  m: EntityManager,
  demo: DemoOrganisation,
  passwordHash: string,
  samplesDir: string,
  report: SeedReport,
): Promise<void> {
  let org = await m.findOneBy(OrganisationEntity, { slug: demo.slug });
  if (!org) {
    org = await m.save(
      OrganisationEntity,
      m.create(OrganisationEntity, { slug: demo.slug, name: demo.name }),
    );
    report.organisations++;
  }
  const before = { ...report };
  let firstAdminId: string | null = null;
  for (const u of demo.users) {
    let user = await m.findOneBy(UserEntity, { organisationId: org.id, email: u.email });
    if (!user) {
      user = await m.save(
        UserEntity,
        m.create(UserEntity, { organisationId: org.id, ...u, passwordHash, active: true }),
      );
      report.users++;
    }
    if (u.role === 'admin' && !firstAdminId) firstAdminId = user.id;
  }
  const detailer = demo.users.find((u) => u.role === 'detailer') ?? demo.users[0];
  const author = detailer
    ? await m.findOneBy(UserEntity, { organisationId: org.id, email: detailer.email })
    : null;

  for (const { job: jobInput, spools } of demo.jobs) {
    let job = await m
      .getRepository(JobEntity)
      .createQueryBuilder('j')
      .where('j.organisationId = :org AND lower(j.number) = lower(:number)', {
        org: org.id,
        number: jobInput.number,
      })
      .getOne();
    if (!job) {
      job = await m.save(JobEntity, m.create(JobEntity, { ...jobInput, organisationId: org.id }));
      report.jobs++;
    }
    for (const s of spools) {
      const exists = await m
        .getRepository(SpoolEntity)
        .createQueryBuilder('s')
        .where('s.jobId = :job AND lower(s.mark) = lower(:mark)', { job: job.id, mark: s.mark })
        .getExists();
      if (exists || !author) continue;
      const spool = await m.save(
        SpoolEntity,
        m.create(SpoolEntity, {
          organisationId: org.id,
          jobId: job.id,
          mark: s.mark,
          lineNumber: s.lineNumber,
        }),
      );
      report.spools++;
      await m.save(
        SpoolRevisionEntity,
        m.create(SpoolRevisionEntity, {
          organisationId: org.id,
          spoolId: spool.id,
          letter: 'A',
          state: 'draft',
          design: loadDesign(s, samplesDir, report),
          note: 'First draft (demo data)',
          authorId: author.id,
        }),
      );
      report.revisions++;
    }
  }

  const added = {
    users: report.users - before.users,
    jobs: report.jobs - before.jobs,
    spools: report.spools - before.spools,
    revisions: report.revisions - before.revisions,
  };
  if (Object.values(added).some((n) => n > 0)) {
    await writeAuditEvent(m, {
      organisationId: org.id,
      actorId: null,
      action: 'seed.load',
      entityType: 'organisation',
      entityId: org.id,
      details: added,
    });
  }
}

/** The sample design for a spool when its file exists and is valid, else the starter design. */
function loadDesign(spool: DemoSpool, samplesDir: string, report: SeedReport): Record<string, unknown> {
  const fallback = starterDesign(spool);
  if (!spool.sampleFile) return fallback;
  const file = path.join(samplesDir, spool.sampleFile);
  if (!existsSync(file)) {
    report.warnings.push(`${spool.mark}: ${spool.sampleFile} not found, starting from an empty design`);
    return fallback;
  }
  try {
    const parsed = spoolDesignSchema.safeParse(JSON.parse(readFileSync(file, 'utf8')));
    if (parsed.success) return parsed.data;
    report.warnings.push(
      `${spool.mark}: ${spool.sampleFile} is not a valid design (${parsed.error.issues[0]?.message})`,
    );
  } catch (err) {
    report.warnings.push(`${spool.mark}: ${spool.sampleFile} could not be read (${String(err)})`);
  }
  return fallback;
}
