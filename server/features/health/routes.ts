import { Router } from 'express';
import type pg from 'pg';

/** GET /api/health: 200 when the database answers within 2 s, 503 otherwise. */
export function healthRouter(pool: pg.Pool): Router {
  const r = Router();
  r.get('/', async (_req, res) => {
    const db = await Promise.race([
      pool.query('select 1').then(() => 'ok' as const, () => 'down' as const),
      new Promise<'down'>((resolve) => setTimeout(() => resolve('down'), 2000).unref()),
    ]);
    res.status(db === 'ok' ? 200 : 503).json({ status: db === 'ok' ? 'ok' : 'degraded', db });
  });
  return r;
}
