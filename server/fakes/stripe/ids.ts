import { randomBytes } from 'node:crypto';

/**
 * Stripe-looking ids (`pi_3Q…`, `ch_3Q…`): a prefix and 24 random base62 characters, so code that
 * checks prefixes or stores ids in varchar columns sees what it will see in production.
 */
const ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

export function randomToken(length = 24): string {
  const bytes = randomBytes(length);
  let out = '';
  for (const b of bytes) out += ALPHABET[b % ALPHABET.length];
  return out;
}

export const newId = (prefix: string) => `${prefix}_${randomToken()}`;

/** Stripe's objects carry Unix seconds, not milliseconds. */
export const unixNow = () => Math.floor(Date.now() / 1000);
