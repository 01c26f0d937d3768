import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { advanceOrderSchema, cancelOrderSchema, listOrdersQuerySchema, recordHydrotestSchema } from '../../../shared/schemas/orders';
import { currentUser, requireRole, requireUser } from '../../lib/auth/guards';
import { parse } from '../../lib/validate';
import { acceptQuote } from './accept';
import type { OrderDeps } from './deps';
import { buildSheet } from './build-sheet';
import { renderBuildSheetPdf } from './build-sheet-pdf';
import { drillingCsv, drillingPattern } from './drilling';
import { getHydrotest, recordHydrotest } from './hydrotest';
import { advanceOrder, cancelOrder, getOrder, listOrders, releaseOrder } from './service';
import { handleEvent, verifyEvent } from './webhook';

const idParams = z.object({ id: z.uuid({ error: 'must be an id (UUID)' }) });
const noteBody = z.object({ note: z.string().trim().max(2000).optional() });

/** `POST /api/quotes/:id/accept`: the buyer accepts an approved offer and is sent to pay the deposit. */
export function acceptRouter(deps: OrderDeps): Router {
  const r = Router();
  r.post('/:id/accept', requireRole('customer'), async (req, res) => {
    const { id } = parse(idParams, req.params, 'path');
    res.status(201).json(await acceptQuote(deps, currentUser(req), id, req.body));
  });
  return r;
}

export function ordersRouter(deps: OrderDeps): Router {
  const r = Router();
  const id = (req: { params: unknown }) => parse(idParams, req.params, 'path').id;
  r.get('/', requireUser, async (req, res) => {
    res.json(await listOrders(deps, currentUser(req), parse(listOrdersQuerySchema, req.query, 'query')));
  });
  r.get('/:id', requireUser, async (req, res) => {
    res.json(await getOrder(deps, currentUser(req), id(req)));
  });
  r.post('/:id/release', requireRole('sales', 'admin'), async (req, res) => {
    res.json(await releaseOrder(deps, currentUser(req), id(req), parse(noteBody, req.body).note));
  });
  r.post('/:id/advance', requireRole('shop', 'admin'), async (req, res) => {
    res.json(await advanceOrder(deps, currentUser(req), id(req), parse(advanceOrderSchema, req.body)));
  });
  r.get('/:id/hydrotest', requireRole('sales', 'shop', 'admin'), async (req, res) => {
    res.json(await getHydrotest(deps, currentUser(req), id(req)));
  });
  r.post('/:id/hydrotest', requireRole('shop', 'admin'), async (req, res) => {
    res.status(201).json(await recordHydrotest(deps, currentUser(req), id(req), parse(recordHydrotestSchema, req.body)));
  });
  r.post('/:id/cancel', requireUser, async (req, res) => {
    const { reason, from } = parse(cancelOrderSchema, req.body);
    res.json(await cancelOrder(deps, currentUser(req), id(req), reason, from));
  });
  r.get('/:id/build-sheet', requireRole('sales', 'shop', 'admin'), async (req, res) => {
    res.json(await buildSheet(deps, currentUser(req), id(req)));
  });
  r.get('/:id/build-sheet.pdf', requireRole('sales', 'shop', 'admin'), async (req, res) => {
    const sheet = await buildSheet(deps, currentUser(req), id(req));
    // the document is made before any header is set: a failure answers the JSON error, never a file
    const pdf = await renderBuildSheetPdf(sheet);
    res.type('application/pdf').set('Content-Disposition', `inline; filename="${sheet.order.number}-build-sheet.pdf"`).send(pdf);
  });
  r.get('/:id/drilling.csv', requireRole('sales', 'shop', 'admin'), async (req, res) => {
    const order = await getOrder(deps, currentUser(req), id(req));
    // the pattern is made before any header is set: a design that cannot be drilled answers its JSON 422, never a .csv
    const csv = drillingCsv(drillingPattern(order.design));
    res.type('text/csv').set('Content-Disposition', `attachment; filename="${order.number}-drilling.csv"`).send(csv);
  });
  return r;
}

/** `POST /api/payments/webhook`, mounted with a raw body parser: the signature covers the exact bytes. */
export function webhookHandler(deps: OrderDeps): RequestHandler {
  return async (req, res) => {
    const event = verifyEvent(deps, Buffer.isBuffer(req.body) ? req.body : undefined, req.get('stripe-signature'));
    res.json({ received: true, outcome: await handleEvent(deps, event) });
  };
}
