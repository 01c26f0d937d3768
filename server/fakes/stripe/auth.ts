import type { RequestHandler } from 'express';
import { StripeFakeError } from './errors';

/**
 * Secret keys only, and only test-mode ones: a live key or a publishable key pointed at the fake is a
 * configuration mistake worth failing loudly on. Bearer (what the SDK sends) and Basic (curl -u) both work.
 */
export const requireTestKey: RequestHandler = (req, res, next) => {
  const header = req.get('authorization') ?? '';
  const [scheme, value = ''] = header.split(' ', 2);
  const key = /^bearer$/i.test(scheme ?? '')
    ? value.trim()
    : /^basic$/i.test(scheme ?? '')
      ? Buffer.from(value, 'base64').toString('utf8').split(':')[0]!
      : '';
  if (!key) {
    throw new StripeFakeError(401, {
      type: 'invalid_request_error',
      message: 'You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. \'Authorization: Bearer YOUR_SECRET_KEY\').',
    });
  }
  if (!key.startsWith('sk_test_')) {
    const shown = key.length > 12 ? `${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}` : key;
    throw new StripeFakeError(401, {
      type: 'invalid_request_error',
      message: `Invalid API Key provided: ${shown}. The local Stripe fake accepts only test-mode secret keys (sk_test_…).`,
    });
  }
  res.locals.apiKey = key;
  next();
};
