import { Router } from 'express';
import type { Db } from '../../../db';
import { savePriceBookSchema } from '../../../shared/schemas/price-book';
import { currentUser, requireRole } from '../../lib/auth/guards';
import { parse } from '../../lib/validate';
import * as service from './service';

/**
 * Admin-only, mounted at `/api/admin/price-book`: GET the active book, PUT a new version
 * (`{ priceBook, note? }` → 201 `{ version, createdAt, priceBook }`).
 */
export function priceBookRouter(deps: { db: Db }): Router {
  const r = Router();
  r.use(requireRole('admin'));
  r.get('/', async (_req, res) => {
    const active = await service.getActivePriceBook(deps.db);
    res.json({ version: active.version, createdAt: active.createdAt, priceBook: active.data });
  });
  r.put('/', async (req, res) => {
    const body = parse(savePriceBookSchema, req.body);
    const saved = await service.savePriceBook(deps.db, body.priceBook, currentUser(req).id, body.note);
    res.status(201).json({ version: saved.version, createdAt: saved.createdAt, priceBook: saved.data });
  });
  return r;
}
