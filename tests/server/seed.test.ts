import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ORGANISATIONS, DEMO_PASSWORD } from '../../server/db/seed/demo-data';
import { seedDemo } from '../../server/db/seed/seed-demo';
import { starterDesign } from '../../server/modules/revisions/starter-design';
import { spoolDesignSchema } from '../../shared/schemas/spool-design.schema';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { testApp } from './helpers/test-app';

let db: TestDatabase;
let samplesDir: string;

const SAMPLE = {
  ...starterDesign({ mark: 'CW-201-S03', lineNumber: 'CW-201' }),
  description: 'sample file design',
};

beforeAll(async () => {
  db = await createTestDatabase();
  samplesDir = mkdtempSync(path.join(tmpdir(), 'tackline-samples-'));
  writeFileSync(path.join(samplesDir, 'cw-201-s03-return-14in.json'), JSON.stringify(SAMPLE));
  writeFileSync(path.join(samplesDir, 'cw-305-s01-rolling-offset-10in.json'), '{"format": "not a design"}');
});
afterAll(async () => {
  await db?.drop();
  rmSync(samplesDir, { recursive: true, force: true });
});

async function counts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const t of ['organisation', 'app_user', 'job', 'spool', 'spool_revision', 'audit_event']) {
    const [row] = await db.dataSource.query(`SELECT count(*)::int AS n FROM ${t}`);
    out[t] = row.n;
  }
  return out;
}

describe('demo seed', () => {
  it('loads the scenario: two shops, six Kestrel users and one Fenwick admin, one job, five spools with drafts', async () => {
    const report = await seedDemo(db.dataSource, { samplesDir, bcryptCost: 4 });
    expect(report).toMatchObject({ organisations: 2, users: 7, jobs: 1, spools: 5, revisions: 5 });
    expect(await counts()).toMatchObject({
      organisation: 2,
      app_user: 7,
      job: 1,
      spool: 5,
      spool_revision: 5,
    });
    const roles = await db.dataSource.query(
      `SELECT u.role FROM app_user u JOIN organisation o ON o.id = u.organisation_id WHERE o.slug = 'kestrel' ORDER BY u.role`,
    );
    expect(roles.map((r: { role: string }) => r.role)).toEqual([
      'admin',
      'detailer',
      'fabricator',
      'fabricator',
      'inspector',
      'viewer',
    ]);
    const [job] = await db.dataSource.query(`SELECT * FROM job`);
    expect(job).toMatchObject({
      number: 'HFD-B-CW',
      title: 'Condenser water, Hall B',
      client: 'Harrow Fields Data Centre',
      units: 'mm',
    });
    expect(job.spec).toEqual({
      material: 'ASTM A106 Gr B',
      schedule: 'STD',
      flangeClass: 150,
      rootGapMm: 3,
      sawKerfMm: 3,
      minPieceLengthMm: 100,
    });
  });

  it('uses a sample design file when present and valid, the starter design otherwise (with a warning)', async () => {
    const rows = await db.dataSource.query(
      `SELECT s.mark, r.design FROM spool s JOIN spool_revision r ON r.spool_id = s.id ORDER BY s.mark`,
    );
    const byMark = Object.fromEntries(rows.map((r: { mark: string; design: unknown }) => [r.mark, r.design]));
    expect(byMark['CW-201-S03']).toEqual(SAMPLE);
    expect(byMark['CW-305-S01']).toEqual(starterDesign({ mark: 'CW-305-S01', lineNumber: 'CW-305' }));
  });

  it('names sample files that exist in samples/ and pass the spool design schema', () => {
    const repoSamples = path.resolve(import.meta.dirname, '../../samples');
    const files = DEMO_ORGANISATIONS.flatMap((o) => o.jobs.flatMap((j) => j.spools.map((s) => s.sampleFile)));
    expect(files.filter(Boolean).length).toBe(5);
    for (const file of files) {
      if (!file) continue;
      const design: unknown = JSON.parse(readFileSync(path.join(repoSamples, file), 'utf8'));
      expect(spoolDesignSchema.safeParse(design).success, file).toBe(true);
    }
  });

  it('every demo account signs in with the demo password', async () => {
    const app = testApp(db.dataSource, db.url);
    for (const org of DEMO_ORGANISATIONS) {
      for (const u of org.users) {
        const res = await request(app)
          .post('/api/auth/sign-in')
          .send({ email: u.email, password: DEMO_PASSWORD });
        expect(res.status, u.email).toBe(200);
        expect(res.body.user).toMatchObject({ role: u.role, organisation: { name: org.name } });
      }
    }
  });

  it('a second run adds nothing', async () => {
    const before = await counts();
    const report = await seedDemo(db.dataSource, { samplesDir, bcryptCost: 4 });
    expect(report).toMatchObject({ organisations: 0, users: 0, jobs: 0, spools: 0, revisions: 0 });
    expect(await counts()).toEqual(before);
  });

  it('a re-seed keeps what users changed and does not bring back what they renamed', async () => {
    await db.dataSource.query(
      `UPDATE job SET title = 'Condenser water, Hall B (rev)' WHERE number = 'HFD-B-CW'`,
    );
    await db.dataSource.query(
      `UPDATE app_user SET display_name = 'Renamed Detailer', role = 'inspector' WHERE email = 'detailer@kestrel.example'`,
    );
    await db.dataSource.query(`UPDATE spool SET line_number = 'CW-201A' WHERE mark = 'CW-201-S03'`);
    await db.dataSource.query(`UPDATE spool_revision SET note = 'edited by a user'`);
    const before = await counts();
    await seedDemo(db.dataSource, { samplesDir, bcryptCost: 4 });
    expect(await counts()).toEqual(before);
    const [job] = await db.dataSource.query(`SELECT title FROM job WHERE number = 'HFD-B-CW'`);
    expect(job.title).toBe('Condenser water, Hall B (rev)');
    const [user] = await db.dataSource.query(
      `SELECT display_name, role FROM app_user WHERE email = 'detailer@kestrel.example'`,
    );
    expect(user).toEqual({ display_name: 'Renamed Detailer', role: 'inspector' });
    const notes = await db.dataSource.query(`SELECT DISTINCT note FROM spool_revision`);
    expect(notes).toEqual([{ note: 'edited by a user' }]);
    const [spool] = await db.dataSource.query(`SELECT line_number FROM spool WHERE mark = 'CW-201-S03'`);
    expect(spool.line_number).toBe('CW-201A');
  });
});
