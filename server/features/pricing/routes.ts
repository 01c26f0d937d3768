import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '../../../db';
import { priceBookTableCsv, priceBookTables, previewTubeImport } from '../../../shared/price-book-csv';
import { savePriceBookSchema } from '../../../shared/schemas/price-book';
import { currentUser, requireRole } from '../../lib/auth/guards';
import { csvFilename } from '../../lib/csv';
import { parse } from '../../lib/validate';
import * as service from './service';

const tableParams = z.object({
  file: z.enum(priceBookTables.map((t) => `${t}.csv`) as [string, ...string[]], { error: `must be one of ${priceBookTables.map((t) => `${t}.csv`).join(', ')}` }),
});
const importBody = z.object({
  csv: z.string({ error: 'Send the file’s text.' }).min(1, { error: 'The file is empty.' }).max(500_000, { error: 'The file is larger than 500 kB.' }),
});
const versionParams = z.object({ version: z.coerce.number({ error: 'must be a version number' }).int().min(1).max(2_147_483_647) });

/**
 * Admin-only, mounted at `/api/admin/price-book`: GET the active book; PUT a new version
 * (`{ priceBook, baseVersion, note }` → 201 `{ version, createdAt, priceBook }`, 409 `stale-version`
 * when another admin saved since `baseVersion`); GET `/versions` (the history) and
 * GET `/versions/:version/diff` (what that version changed against the one before); GET
 * `/tables/<table>.csv` (one table of the active book as CSV); POST `/tubes/import-preview`
 * (`{ csv }`: the tube table read from a file and compared with the active book, problems named by
 * line and column; nothing is stored: the admin then saves the book with PUT as usual).
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
  r.get('/tables/:file', async (req, res) => {
    const { file } = parse(tableParams, req.params, 'path');
    const active = await service.getActivePriceBook(deps.db);
    const table = file.replace(/\.csv$/, '') as (typeof priceBookTables)[number];
    res
      .type('text/csv; charset=utf-8')
      .set('Content-Disposition', `attachment; filename="${csvFilename(`price-book-v${active.version}-${table}`)}"`)
      .send(`\uFEFF${priceBookTableCsv(active.data, table)}`);
  });
  r.post('/tubes/import-preview', async (req, res) => {
    const { csv } = parse(importBody, req.body);
    const active = await service.getActivePriceBook(deps.db);
    res.json({ baseVersion: active.version, ...previewTubeImport(csv, active.data) });
  });
  return r;
}
