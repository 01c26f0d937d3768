import Stripe from 'stripe';

/**
 * The app's only door to Stripe. Production leaves STRIPE_API_URL unset and the SDK talks to
 * api.stripe.com; local runs and tests set it to the local fake (`http://127.0.0.1:12111`), so the
 * same SDK calls, errors and webhook signatures are exercised everywhere.
 */
export interface StripeSettings {
  STRIPE_SECRET_KEY: string;
  /** base URL of a Stripe-compatible API (the local fake); unset: the SDK's defaults */
  STRIPE_API_URL?: string;
}

/** Local defaults the config and the fake agree on (the fake accepts any sk_test_ key). */
export const STRIPE_LOCAL_DEFAULTS = {
  STRIPE_SECRET_KEY: 'sk_test_bundlesmith_local',
  STRIPE_WEBHOOK_SECRET: 'whsec_bundlesmith_local',
  STRIPE_FAKE_PORT: 12111,
  STRIPE_API_URL: 'http://127.0.0.1:12111',
} as const;

export function createStripe(config: StripeSettings): Stripe {
  const options: Stripe.StripeConfig = {
    // the SDK retries network errors, 409s and 5xx with the same idempotency key, so a retry is safe
    maxNetworkRetries: 2,
    timeout: 20_000,
    appInfo: { name: 'Bundlesmith' },
  };
  if (config.STRIPE_API_URL) {
    const url = new URL(config.STRIPE_API_URL);
    const protocol = url.protocol === 'http:' ? 'http' : 'https';
    options.protocol = protocol;
    options.host = url.hostname;
    options.port = url.port || (protocol === 'http' ? 80 : 443);
  }
  return new Stripe(config.STRIPE_SECRET_KEY, options);
}

/**
 * Verifies a webhook delivery and returns its event. `rawBody` must be the bytes as received
 * (express.raw), never re-serialised JSON, or the signature cannot match. Throws Stripe's
 * StripeSignatureVerificationError for a missing, bad or stale (older than `toleranceSeconds`) signature.
 */
export function constructEvent(
  rawBody: string | Buffer,
  signatureHeader: string | string[] | undefined,
  secret: string,
  toleranceSeconds = 300,
): Stripe.Event {
  const header = Array.isArray(signatureHeader) ? signatureHeader[0] : signatureHeader;
  if (!header) {
    throw new Stripe.errors.StripeSignatureVerificationError(header ?? '', rawBody.toString(), {
      message: 'No Stripe-Signature header in the request.',
    });
  }
  return Stripe.webhooks.constructEvent(rawBody, header, secret, toleranceSeconds);
}

/** True for the error constructEvent throws on a bad signature (answer 400, never 500). */
export const isSignatureError = (err: unknown): err is InstanceType<typeof Stripe.errors.StripeSignatureVerificationError> =>
  err instanceof Stripe.errors.StripeSignatureVerificationError;

/**
 * Where the buyer pays in local runs: the fake's stand-in for Stripe's hosted page. After paying it
 * redirects to `returnUrl` with `payment_intent` and `redirect_status`; the order still waits for the
 * webhook, since the redirect is only the browser's word.
 */
export function localPaymentPageUrl(fakeBaseUrl: string, paymentIntentId: string, returnUrl: string): string {
  const url = new URL(`/pay/${encodeURIComponent(paymentIntentId)}`, fakeBaseUrl);
  url.searchParams.set('return_url', returnUrl);
  return url.toString();
}
