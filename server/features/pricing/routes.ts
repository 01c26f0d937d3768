import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '../../../db';
import { savePriceBookSchema } from '../../../shared/schemas/price-book';
import { currentUser, requireRole } from '../../lib/auth/guards';
import { parse } from '../../lib/validate';
import * as service from './service';

const versionParams = z.object({ version: z.coerce.number({ error: 'must be a version number' }).int().min(1).max(2_147_483_647) });

/**
 * Admin-only, mounted at `/api/admin/price-book`: GET the active book; PUT a new version
 * (`{ priceBook, baseVersion, note }` → 201 `{ version, createdAt, priceBook }`, 409 `stale-version`
 * when another admin saved since `baseVersion`); GET `/versions` (the history) and
 * GET `/versions/:version/diff` (what that version changed against the one before).
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
    const saved = await service.saveEditedPriceBook(deps.db, body, currentUser(req).id);
    res.status(201).json({ version: saved.version, createdAt: saved.createdAt, priceBook: saved.data });
  });
  r.get('/versions', async (_req, res) => {
    res.json({ versions: await service.listVersions(deps.db) });
  });
  r.get('/versions/:version/diff', async (req, res) => {
    const { version } = parse(versionParams, req.params, 'path');
    res.json(await service.versionDiff(deps.db, version));
  });
  return r;
}
