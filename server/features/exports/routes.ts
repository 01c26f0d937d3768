/**
 * CSV downloads of the lists, mounted at `/api` before the record routers: `GET /api/quotes/export.csv`
 * and `GET /api/orders/export.csv` take the list's filters and sort (not its page) and answer every
 * matching record the viewer may see.
 */
import { Router } from 'express';
import { listOrdersQuerySchema } from '../../../shared/schemas/orders';
import { listQuotesQuerySchema } from '../../../shared/schemas/quotes';
import { currentUser, requireUser } from '../../lib/auth/guards';
import { csvFilename, sendCsv } from '../../lib/csv';
import { parse } from '../../lib/validate';
import type { OrderDeps } from '../orders/deps';
import { ORDER_CSV_HEADER, orderCsvRows, quoteCsvHeader, quoteCsvRows } from './service';

const quoteQuery = listQuotesQuerySchema.omit({ page: true, pageSize: true });
const orderQuery = listOrdersQuerySchema.omit({ page: true, pageSize: true });

export function exportsRouter(deps: OrderDeps): Router {
  const r = Router();
  r.get('/quotes/export.csv', requireUser, async (req, res) => {
    const viewer = currentUser(req);
    const query = parse(quoteQuery, req.query, 'query');
    await sendCsv(res, csvFilename('quotes'), quoteCsvHeader(viewer), quoteCsvRows(deps, viewer, query));
  });
  r.get('/orders/export.csv', requireUser, async (req, res) => {
    const query = parse(orderQuery, req.query, 'query');
    await sendCsv(res, csvFilename('orders'), ORDER_CSV_HEADER, orderCsvRows(deps, currentUser(req), query));
  });
  return r;
}
