import Stripe from 'stripe';
import { HttpError } from './errors';

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
    // the SDK retries network errors, 409s and 5xx with the same idempotency key, so a retry is safe;
    // one retry (after about half a second) and a 10 s timeout keep a buyer waiting at most ~20 s
    // when Stripe is down, and a refused connection is answered (503) in well under a second
    maxNetworkRetries: 1,
    timeout: 10_000,
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

export const PAYMENTS_UNAVAILABLE_MESSAGE = 'Payments are unavailable right now; nothing was charged. Try again in a few minutes.';

/** True when the payment service could not be reached or failed on its side (not a refused request). */
export function isPaymentServiceDown(err: unknown): boolean {
  if (err instanceof Stripe.errors.StripeConnectionError) return true;
  if (err instanceof Stripe.errors.StripeAPIError || err instanceof Stripe.errors.StripeRateLimitError) return true;
  return err instanceof Stripe.errors.StripeError && (err.statusCode ?? 0) >= 500;
}

/**
 * Runs a call to the payment service; an outage becomes a 503 `payments-unavailable` that tells the
 * buyer nothing was charged. Call it before anything is stored, so an outage leaves nothing half-way.
 */
export async function paymentCall<T>(call: () => Promise<T>): Promise<T> {
  try {
    return await call();
  } catch (err) {
    if (!isPaymentServiceDown(err)) throw err;
    console.error(`[payments] unavailable: ${(err as Error).message}`);
    throw new HttpError(503, 'payments-unavailable', PAYMENTS_UNAVAILABLE_MESSAGE);
  }
}

/**
 * The smallest amount Stripe charges, in minor units, per settlement currency (Stripe's "minimum
 * and maximum charge amounts" table, (memory)); 50 for currencies not listed.
 */
const MINIMUM_CHARGE_MINOR: Record<string, number> = {
  USD: 50, EUR: 50, CAD: 50, AUD: 50, NZD: 50, CHF: 50, SGD: 50, GBP: 30, DKK: 250, NOK: 300, SEK: 300,
  JPY: 50, MXN: 1000, HKD: 400, PLN: 200, CZK: 1500, HUF: 17500, INR: 50, BRL: 50,
};

export const minimumChargeMinor = (currency: string) => MINIMUM_CHARGE_MINOR[currency.toUpperCase()] ?? 50;

/** The deposit asked at acceptance: the book's share of the offer total, rounded to a minor unit. */
export const depositMinor = (totalMinor: number, depositPct: number) => Math.round((totalMinor * depositPct) / 100);

/**
 * Refuses (422 `below-payment-minimum`) a deposit the payment service would not charge; checked when
 * an offer is approved, so a buyer is never handed an offer they cannot pay.
 */
export function assertChargeable(depositMinorUnits: number, currency: string) {
  const min = minimumChargeMinor(currency);
  if (depositMinorUnits < min) {
    throw new HttpError(
      422,
      'below-payment-minimum',
      `The deposit of this offer (${depositMinorUnits} ${currency.toUpperCase()} minor units) is below the payment minimum of ${min}; check the price and its overrides.`,
    );
  }
}
