import express, { Router, type Response } from 'express';
import { z } from 'zod';
import { StripeFakeError } from './errors';
import { messagePage, paymentPage } from './page-html';
import { NO_REQUEST } from './objects';
import { confirmIntent, type Ledger } from './payment-intents';

/**
 * The buyer-facing stand-in for Stripe's hosted payment page: GET shows the amount and two test
 * outcomes, POST confirms the intent with Stripe's test method for that outcome and sends the
 * browser back to `return_url` with the query Stripe adds (`payment_intent`, `redirect_status`).
 * The app must still wait for the webhook: the redirect is only the buyer's word.
 */
const returnUrl = z.url({ protocol: /^https?$/ });
const pageQuery = z.object({ return_url: returnUrl });
const pageForm = z.object({ return_url: returnUrl, outcome: z.enum(['succeed', 'decline']) });

const OUTCOME_METHOD = { succeed: 'pm_card_visa', decline: 'pm_card_chargeDeclined' } as const;

function sendPage(res: Response, status: number, html: string) {
  // inline styles only; no scripts, no frames, nothing fetched from elsewhere
  res.setHeader('Content-Security-Policy', "default-src 'none'; style-src 'unsafe-inline'; frame-ancestors 'none'");
  res.setHeader('Cache-Control', 'no-store');
  res.status(status).type('html').send(html);
}

export function hostedPageRoutes(ledger: Ledger, publicUrl: string | undefined) {
  const router = Router();
  router.use('/pay', express.urlencoded({ extended: false, limit: '16kb' }));

  router.get('/pay/:id', (req, res) => {
    const query = pageQuery.safeParse(req.query);
    if (!query.success) return sendPage(res, 400, messagePage('Test payment', 'A return_url (http or https) is required.'));
    const intent = ledger.state.paymentIntents.get(req.params.id);
    if (!intent) return sendPage(res, 404, messagePage('Test payment', 'No such payment.'));
    const action = `${publicUrl ?? ''}/pay/${encodeURIComponent(intent.id)}`;
    sendPage(res, 200, paymentPage(intent, action, query.data.return_url));
  });

  router.post('/pay/:id', (req, res) => {
    const form = pageForm.safeParse(req.body);
    if (!form.success) return sendPage(res, 400, messagePage('Test payment', 'Choose one of the two test cards.'));
    const { outcome, return_url } = form.data;
    let succeeded: boolean;
    try {
      confirmIntent(ledger, req.params.id, OUTCOME_METHOD[outcome], NO_REQUEST);
      succeeded = true;
    } catch (err) {
      if (!(err instanceof StripeFakeError)) throw err;
      if (err.body.type !== 'card_error') return sendPage(res, err.status, messagePage('Test payment', err.body.message));
      succeeded = false;
    }
    const intent = ledger.state.paymentIntents.get(req.params.id)!;
    const target = new URL(return_url);
    target.searchParams.set('payment_intent', intent.id);
    target.searchParams.set('payment_intent_client_secret', intent.client_secret);
    target.searchParams.set('redirect_status', succeeded ? 'succeeded' : 'failed');
    res.redirect(303, target.toString());
  });

  return router;
}
