import { Router } from 'express';
import type pg from 'pg';
import { rateRequestSchema, sizeRequestSchema } from '../../../shared/schemas/thermal';
import { publicApiLimiter } from '../../lib/rate-limits';
import { parse } from '../../lib/validate';
import * as service from './service';

/**
 * The public thermal API (no sign-in; a cap per address): rate a given geometry, or size a cooler
 * for a duty. Malformed → 400 naming the field; impossible → 422 with the physics in words.
 */
export function thermalRouter(pool: pg.Pool): Router {
  const r = Router();
  r.use(publicApiLimiter(pool, 'thermal'));
  r.post('/rate', (req, res) => {
    res.json(service.rateDesign(parse(rateRequestSchema, req.body)));
  });
  r.post('/size', (req, res) => {
    res.json(service.sizeCooler(parse(sizeRequestSchema, req.body)));
  });
  return r;
}
