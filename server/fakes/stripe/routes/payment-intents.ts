import { Router } from 'express';
import { z } from 'zod';
import type { PaymentIntent } from '../objects';
import { boolean, currency, expand, integer, metadata, parseParams } from '../params';
import { cancelIntent, confirmIntent, createIntent, getIntent, type Ledger } from '../payment-intents';
import { originOf } from './origin';

const createParams = z
  .object({
    amount: integer(1),
    currency,
    metadata: metadata.optional(),
    description: z.string().max(1000).optional(),
    receipt_email: z.email().optional(),
    automatic_payment_methods: z
      .object({ enabled: boolean, allow_redirects: z.enum(['always', 'never']).optional() })
      .strict()
      .optional(),
    payment_method_types: z.array(z.string()).optional(),
    expand,
  })
  .strict();

const confirmParams = z
  .object({ payment_method: z.string().min(1).optional(), return_url: z.url().optional(), expand })
  .strict();

const cancelParams = z
  .object({
    cancellation_reason: z.enum(['duplicate', 'fraudulent', 'requested_by_customer', 'abandoned']).optional(),
    expand,
  })
  .strict();

const retrieveParams = z.object({ client_secret: z.string().optional(), expand }).strict();

/** `expand[]=latest_charge` embeds the charge, the one expansion the app is likely to want. */
function render(ledger: Ledger, intent: PaymentIntent, wanted: string[] | undefined) {
  if (!wanted?.includes('latest_charge') || !intent.latest_charge) return intent;
  return { ...intent, latest_charge: ledger.state.charges.get(intent.latest_charge) ?? intent.latest_charge };
}

export function paymentIntentRoutes(ledger: Ledger) {
  const router = Router();

  router.post('/payment_intents', (req, res) => {
    const { expand: wanted, ...input } = parseParams(createParams, req.body);
    res.json(render(ledger, createIntent(ledger, input), wanted));
  });

  router.get('/payment_intents/:id', (req, res) => {
    const { expand: wanted } = parseParams(retrieveParams, req.query);
    res.json(render(ledger, getIntent(ledger, req.params.id), wanted));
  });

  router.post('/payment_intents/:id/confirm', (req, res) => {
    const { payment_method, expand: wanted } = parseParams(confirmParams, req.body);
    res.json(render(ledger, confirmIntent(ledger, req.params.id, payment_method, originOf(res)), wanted));
  });

  router.post('/payment_intents/:id/cancel', (req, res) => {
    const { cancellation_reason, expand: wanted } = parseParams(cancelParams, req.body);
    res.json(render(ledger, cancelIntent(ledger, req.params.id, cancellation_reason, originOf(res)), wanted));
  });

  return router;
}
