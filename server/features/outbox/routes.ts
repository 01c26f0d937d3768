import { Router } from 'express';
import { requireRole } from '../../lib/auth/guards';
import { HttpError, notFound } from '../../lib/errors';

/**
 * GET /api/dev/outbox: the e-mails the local SMTP sink caught (admin only). Exists only where
 * OUTBOX_URL points at the sink; in production mail leaves through a real SMTP service instead.
 */
export function outboxRouter(outboxUrl: string | undefined): Router {
  const r = Router();
  r.get('/outbox', requireRole('admin'), async (req, res) => {
    if (!outboxUrl) throw notFound('There is no local mail sink in this installation.');
    const to = typeof req.query.to === 'string' ? `?to=${encodeURIComponent(req.query.to)}` : '';
    let response: Response;
    try {
      response = await fetch(`${outboxUrl}/messages${to}`, { signal: AbortSignal.timeout(3000) });
    } catch {
      throw new HttpError(503, 'outbox-down', 'The local mail sink does not answer; is it running (npm start)?');
    }
    if (!response.ok) throw new HttpError(502, 'outbox-error', `The local mail sink answered ${response.status}.`);
    res.json(await response.json());
  });
  return r;
}
