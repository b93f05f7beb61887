import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Health } from '../../../shared/schemas/health.schema';

/** GET /api/health: 200 when the database answers within two seconds, 503 otherwise. No sign-in needed. */
export function healthRouter(ds: DataSource): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const up = await pingDatabase(ds, 2000);
    const body: Health = up ? { status: 'ok', database: 'up' } : { status: 'degraded', database: 'down' };
    res.status(up ? 200 : 503).json(body);
  });
  return router;
}

async function pingDatabase(ds: DataSource, timeoutMs: number): Promise<boolean> {
  if (!ds.isInitialized) return false;
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<boolean>((resolve) => {
    timer = setTimeout(() => resolve(false), timeoutMs);
  });
  const ping = ds.query('SELECT 1').then(
    () => true,
    () => false,
  );
  try {
    return await Promise.race([ping, timeout]);
  } finally {
    clearTimeout(timer);
  }
}
