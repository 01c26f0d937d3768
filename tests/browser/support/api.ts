/**
 * Setting up state through the API with Node's fetch (what a test does not need to click through):
 * sign in, keep the session cookie, send the header every state-changing request needs.
 */
import { expect } from 'vitest';
import { BASE_URL, DEMO_PASSWORD } from './browser';

const HEADERS = { 'Content-Type': 'application/json', 'X-Requested-With': 'bundlesmith', Origin: BASE_URL };

/** Signs in; returns the session cookie. */
export async function apiSignIn(email: string): Promise<string> {
  const res = await fetch(`${BASE_URL}/api/auth/login`, { method: 'POST', headers: HEADERS, body: JSON.stringify({ email, password: DEMO_PASSWORD }) });
  expect(res.status, `sign-in of ${email}`).toBe(200);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

/** One call with that cookie; a non-2xx answer fails with its status and body. */
export async function api<T>(cookie: string, method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${BASE_URL}/api${path}`, { method, headers: { ...HEADERS, Cookie: cookie }, body: body === undefined ? undefined : JSON.stringify(body) });
  const text = await res.text();
  expect(res.ok, `${method} ${path}: ${res.status} ${text.slice(0, 300)}`).toBe(true);
  return JSON.parse(text) as T;
}

export type Api = <T>(method: string, path: string, body?: unknown) => Promise<T>;

/** Signs in and returns a caller that keeps the session. */
export async function apiAs(email: string): Promise<Api> {
  const cookie = await apiSignIn(email);
  return <T>(method: string, path: string, body?: unknown) => api<T>(cookie, method, path, body);
}
