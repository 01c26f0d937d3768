import { Router, type RequestHandler } from 'express';
import multer from 'multer';
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
import { HttpError } from '../../lib/errors';
import { parse } from '../../lib/validate';
import { addAttachment, MAX_UPLOAD_BYTES, readAttachment } from './attachments';
import type { QuoteDeps } from './deps';
import { patchQuote, previewChange } from './edit';
import { offerPdf } from './offer';
import { createQuote, getQuote, listQuotes } from './service';
import { approve, assign, decline, requestChange, sendBack } from './workflow';

const idParams = z.object({ id: z.uuid({ error: 'must be a quote id (UUID)' }) });
const attachmentParams = idParams.extend({ attachmentId: z.uuid({ error: 'must be an attachment id (UUID)' }) });
const versionBody = z.object({ version: z.int().min(1) });
const revisionQuery = z.object({ revision: z.coerce.number().int().min(1).optional() });
const pdfQuery = revisionQuery.extend({ units: z.enum(['SI', 'US']).default('SI') });

/** One file per request, at most 20 MB, kept in memory until its content is checked. */
function singleUpload(): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_UPLOAD_BYTES, files: 1 } }).single('file');
  return (req, res, next) =>
    upload(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(new HttpError(413, 'too-large', 'The file is larger than 20 MB.', { file: 'at most 20 MB' }));
        return next(new HttpError(400, 'invalid-input', `Upload refused: ${err.message}.`, { [err.field ?? 'file']: err.message }));
      }
      next(err);
    });
}

export function quotesRouter(deps: QuoteDeps): Router {
  const r = Router();
  const sales = requireRole('sales', 'admin');
  const id = (req: { params: unknown }) => parse(idParams, req.params, 'path').id;

  r.post('/', requireRole('customer'), async (req, res) => {
    res.status(201).json(await createQuote(deps, currentUser(req), parse(createQuoteSchema, req.body)));
  });
  r.get('/', requireUser, async (req, res) => {
    res.json(await listQuotes(deps, currentUser(req), parse(listQuotesQuerySchema, req.query, 'query')));
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
    res
      .type(file.contentType)
      .set('Content-Disposition', `attachment; filename="${file.filename.replace(/"/g, '')}"`)
      .set('X-Content-Type-Options', 'nosniff')
      .send(file.content);
  });
  return r;
}
