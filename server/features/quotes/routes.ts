import { Router } from 'express';
import { z } from 'zod';
import {
  approveQuoteSchema,
  createQuoteSchema,
  listQuotesQuerySchema,
  patchQuoteSchema,
  previewChangeSchema,
  reasonSchema,
} from '../../../shared/schemas/quotes';
import { currentUser, requireRole, requireUser } from '../../lib/auth/guards';
import { parse } from '../../lib/validate';
import { addAttachment, readAttachment } from './attachments';
import { shopLimits } from './buildable';
import type { QuoteDeps } from './deps';
import { patchQuote, previewChange } from './edit';
import { offerPdf } from './offer';
import { getQuote, listQuotes, submitQuote } from './service';
import { singleUpload } from './upload';
import { approve, assign, decline, requestChange, sendBack } from './workflow';

const idParams = z.object({ id: z.uuid({ error: 'must be a quote id (UUID)' }) });
const attachmentParams = idParams.extend({ attachmentId: z.uuid({ error: 'must be an attachment id (UUID)' }) });
const versionBody = z.object({ version: z.int().min(1) });
const revisionQuery = z.object({ revision: z.coerce.number().int().min(1).optional() });
const pdfQuery = revisionQuery.extend({ units: z.enum(['SI', 'US']).default('SI') });
/** A retry-safe submission: the client sends one key per request form (a UUID), the same on a retry. */
const idempotencyHeader = z.object({
  'Idempotency-Key': z
    .string()
    .regex(/^[\x21-\x7e]{8,200}$/, { error: 'must be 8 to 200 visible ASCII characters (a UUID)' })
    .optional(),
});

export function quotesRouter(deps: QuoteDeps): Router {
  const r = Router();
  const sales = requireRole('sales', 'admin');
  const id = (req: { params: unknown }) => parse(idParams, req.params, 'path').id;

  r.post('/', requireRole('customer'), async (req, res) => {
    const key = parse(idempotencyHeader, { 'Idempotency-Key': req.get('Idempotency-Key') }, 'header')['Idempotency-Key'];
    const { quote, created, designChoice } = await submitQuote(deps, currentUser(req), parse(createQuoteSchema, req.body), key);
    // 201 for a new quote; 200 with the same quote for a retry of a submission already stored;
    // `designChoice`: whether the design picked on the sizing page was kept, or why not (issue 12)
    res.status(created ? 201 : 200).json(designChoice ? { ...quote, designChoice } : quote);
  });
  r.get('/', requireUser, async (req, res) => {
    res.json(await listQuotes(deps, currentUser(req), parse(listQuotesQuerySchema, req.query, 'query')));
  });
  // the shop's limits from the active price book (issue 12): the workspace marks a design outside them as unbuildable
  r.get('/shop-limits', sales, async (_req, res) => {
    res.json(await shopLimits(deps));
  });
  r.get('/:id', requireUser, async (req, res) => {
    const { revision } = parse(revisionQuery, req.query, 'query');
    res.json(await getQuote(deps, currentUser(req), id(req), revision));
  });
  r.patch('/:id', sales, async (req, res) => {
    res.json(await patchQuote(deps, currentUser(req), id(req), parse(patchQuoteSchema, req.body)));
  });
  r.post('/:id/preview', sales, async (req, res) => {
    res.json(await previewChange(deps, currentUser(req), id(req), parse(previewChangeSchema, req.body)));
  });
  r.post('/:id/assign', sales, async (req, res) => {
    res.json(await assign(deps, currentUser(req), id(req), parse(versionBody, req.body).version));
  });
  r.post('/:id/approve', sales, async (req, res) => {
    res.json(await approve(deps, currentUser(req), id(req), parse(approveQuoteSchema, req.body)));
  });
  r.post('/:id/questions', sales, async (req, res) => {
    res.json(await sendBack(deps, currentUser(req), id(req), parse(reasonSchema, req.body)));
  });
  r.post('/:id/decline', sales, async (req, res) => {
    res.json(await decline(deps, currentUser(req), id(req), parse(reasonSchema, req.body)));
  });
  r.post('/:id/request-change', requireRole('customer'), async (req, res) => {
    res.json(await requestChange(deps, currentUser(req), id(req), parse(reasonSchema, req.body)));
  });
  r.get('/:id/offer.pdf', requireUser, async (req, res) => {
    const opts = parse(pdfQuery, req.query, 'query');
    const { pdf, filename } = await offerPdf(deps, currentUser(req), id(req), opts);
    res.type('application/pdf').set('Content-Disposition', `inline; filename="${filename}"`).send(pdf);
  });
  r.post('/:id/attachments', requireUser, singleUpload(), async (req, res) => {
    res.status(201).json(await addAttachment(deps, currentUser(req), id(req), req.file));
  });
  r.get('/:id/attachments/:attachmentId', requireUser, async (req, res) => {
    const p = parse(attachmentParams, req.params, 'path');
    const file = await readAttachment(deps, currentUser(req), p.id, p.attachmentId);
    // RFC 6266 with an ASCII fallback and the exact name as RFC 5987 `filename*=UTF-8''…` (content-disposition)
    res.attachment(file.filename).type(file.contentType).set('X-Content-Type-Options', 'nosniff').send(file.content);
  });
  return r;
}
