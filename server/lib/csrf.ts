import type { RequestHandler } from 'express';
import { HttpError } from './errors';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request protection for the JSON API. A state-changing request must
 *  - carry `X-Requested-With: bundlesmith` (a cross-site form cannot set headers, and a cross-site
 *    fetch that sets one needs a CORS preflight this server never grants), and
 *  - when the browser sends `Origin` (or, failing that, `Referer`), come from one of our origins.
 * Paths in `exempt` (e.g. a payment webhook verified by its own signature) are skipped.
 */
export function csrfGuard(allowedOrigins: string[], exempt: string[] = []): RequestHandler {
  const allowed = new Set(allowedOrigins.map((o) => new URL(o).origin));
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method) || exempt.includes(req.path)) return next();
    const source = req.get('origin') ?? refererOrigin(req.get('referer'));
    const sameHost = source !== undefined && req.get('host') !== undefined && safeHost(source) === req.get('host');
    if (source !== undefined && !allowed.has(source) && !sameHost) {
      return next(new HttpError(403, 'cross-site', 'Requests from another site are refused.'));
    }
    if (req.get('x-requested-with') !== 'bundlesmith') {
      return next(new HttpError(403, 'cross-site', 'Missing header X-Requested-With: bundlesmith.'));
    }
    next();
  };
}

function refererOrigin(referer: string | undefined): string | undefined {
  if (!referer) return undefined;
  try {
    return new URL(referer).origin;
  } catch {
    return 'invalid';
  }
}

function safeHost(origin: string): string | undefined {
  try {
    return new URL(origin).host;
  } catch {
    return undefined;
  }
}
