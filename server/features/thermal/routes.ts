import { Router } from 'express';
import type pg from 'pg';
import { rateRequestSchema, sizeRequestSchema } from '../../../shared/schemas/thermal';
import type { Config } from '../../lib/config';
import { publicApiLimiter } from '../../lib/rate-limits';
import { rateInPool, sizeInPool, startThermalPool } from '../../lib/thermal-pool';
import { parse } from '../../lib/validate';

/**
 * The public thermal API (no sign-in; a cap per address): rate a given geometry, or size a cooler
 * for a duty. Malformed or out of range → 400 naming the field; impossible → 422 with the physics in
 * words. The engine runs in the thermal worker pool within THERMAL_TIME_BUDGET_MS (503 past it).
 */
export function thermalRouter(pool: pg.Pool, config: Config): Router {
  startThermalPool(config);
  const r = Router();
  r.use(publicApiLimiter(pool, 'thermal'));
  r.post('/rate', async (req, res) => {
    res.json(await rateInPool(config, parse(rateRequestSchema, req.body)));
  });
  r.post('/size', async (req, res) => {
    res.json(await sizeInPool(config, parse(sizeRequestSchema, req.body)));
  });
  return r;
}
