/**
 * The link that finishes a self-registration carries the registration itself, sealed (AES-256-GCM,
 * key derived from SESSION_SECRET): nothing is stored until the owner of the address follows it, so
 * the request answers the same whether or not the address or the organisation exists, and nobody
 * can hold an address or a company name by registering it without reading that mailbox.
 */
import { createCipheriv, createDecipheriv, createHash, randomBytes } from 'node:crypto';

export interface PendingRegistration {
  name: string;
  email: string;
  passwordHash: string;
  organizationName: string;
  /** ms since the epoch */
  expiresAt: number;
}

const key = (secret: string) => createHash('sha256').update(`bundlesmith registration link\0${secret}`).digest();

export function sealRegistration(secret: string, pending: PendingRegistration): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv('aes-256-gcm', key(secret), iv);
  const body = Buffer.concat([cipher.update(JSON.stringify(pending), 'utf8'), cipher.final()]);
  return Buffer.concat([iv, cipher.getAuthTag(), body]).toString('base64url');
}

/** The registration in a link, or null when the link was altered, sealed with another secret or has expired. */
export function openRegistration(secret: string, token: string, now = Date.now()): PendingRegistration | null {
  try {
    const raw = Buffer.from(token, 'base64url');
    if (raw.length < 29) return null;
    const decipher = createDecipheriv('aes-256-gcm', key(secret), raw.subarray(0, 12));
    decipher.setAuthTag(raw.subarray(12, 28));
    const pending = JSON.parse(Buffer.concat([decipher.update(raw.subarray(28)), decipher.final()]).toString('utf8')) as PendingRegistration;
    return pending.expiresAt > now ? pending : null;
  } catch {
    return null;
  }
}
