import { Router } from 'express';
import { z } from 'zod';
import { noSuch } from '../errors';
import { expand, integer, metadata, parseParams } from '../params';
import type { Ledger } from '../payment-intents';
import { createRefund } from '../refunds';
import { originOf } from './origin';

const createParams = z
  .object({
    payment_intent: z.string().min(1).optional(),
    charge: z.string().min(1).optional(),
    amount: integer(1).optional(),
    reason: z.enum(['duplicate', 'fraudulent', 'requested_by_customer']).optional(),
    metadata: metadata.optional(),
    expand,
  })
  .strict();

/** Refunds, and the charges they act on (GET only: charges are made by confirming an intent). */
export function refundRoutes(ledger: Ledger) {
  const router = Router();

  router.post('/refunds', (req, res) => {
    const { expand: _ignored, ...input } = parseParams(createParams, req.body);
    res.json(createRefund(ledger, input, originOf(res)));
  });

  router.get('/refunds/:id', (req, res) => {
    const refund = ledger.state.refunds.get(req.params.id);
    if (!refund) throw noSuch('refund', req.params.id);
    res.json(refund);
  });

  router.get('/charges/:id', (req, res) => {
    const charge = ledger.state.charges.get(req.params.id);
    if (!charge) throw noSuch('charge', req.params.id, 'charge');
    res.json(charge);
  });

  return router;
}
