import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { createTestDatabase, type TestDatabase } from './helpers/test-db';
import { testApp } from './helpers/test-app';

let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db?.drop();
});

describe('GET /api/health', () => {
  it('answers 200 ok / up without a session when the database answers', async () => {
    const res = await request(testApp(db.dataSource, db.url)).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'up' });
  });

  it('answers 503 degraded / down when the database is gone', async () => {
    const ds = createDataSource(db.url, { poolSize: 1 });
    await ds.initialize();
    const app = testApp(ds, db.url);
    await ds.destroy();
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ status: 'degraded', database: 'down' });
  });
});
