/**
 * The one request module: every call to the server goes through `request`.
 * It speaks JSON under `/api`, sends the anti-CSRF header the server requires, turns the server's
 * error shape into an `ApiError`, and reports an expired session (401) to whoever registered for it.
 */

export type FieldErrors = Record<string, string>;

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: FieldErrors;

  constructor(status: number, code: string, message: string, fields: FieldErrors = {}) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

/** A message fit to show a person, whatever was thrown. */
export function errorMessage(value: unknown): string {
  if (isApiError(value)) return value.message;
  return 'Something went wrong. Please try again.';
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

interface RequestOptions {
  method?: Method;
  body?: unknown;
  /** Paths whose 401 means "not signed in yet" rather than "session expired". */
  quietUnauthorized?: boolean;
  /** Extra request headers (e.g. `Idempotency-Key`). */
  headers?: Record<string, string>;
}

let unauthorizedHandler: (() => void) | null = null;

/** main.ts registers what happens when the session has expired (clear the store, go to sign-in). */
export function onUnauthorized(handler: () => void): void {
  unauthorizedHandler = handler;
}

const BASE = '/api';

export async function request<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = {
    ...options.headers,
    Accept: 'application/json',
    'X-Requested-With': 'bundlesmith',
  };
  const isForm = typeof FormData !== 'undefined' && options.body instanceof FormData;
  if (options.body !== undefined && !isForm) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(`${BASE}${path}`, {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : isForm ? (options.body as FormData) : JSON.stringify(options.body),
    });
  } catch {
    throw new ApiError(0, 'network', 'Could not reach the server. Check your connection and try again.');
  }

  if (response.status === 401 && !options.quietUnauthorized) unauthorizedHandler?.();
  if (!response.ok) throw await toApiError(response);
  if (response.status === 204) return undefined as T;

  const text = await response.text();
  if (text === '') return undefined as T;
  try {
    return JSON.parse(text) as T;
  } catch {
    throw new ApiError(response.status, 'bad-response', 'The server sent a reply we could not read.');
  }
}

/**
 * A document from the server (a PDF, a CSV), read whole: a refusal (`{ error }` JSON) throws the
 * `ApiError` with the server's message, so a failed document is never saved as if it were the file.
 */
export async function fetchFile(path: string): Promise<Blob> {
  let response: Response;
  try {
    response = await fetch(`${BASE}${path}`, { headers: { 'X-Requested-With': 'bundlesmith' }, credentials: 'same-origin' });
  } catch {
    throw new ApiError(0, 'network', 'Could not reach the server. Check your connection and try again.');
  }
  if (response.status === 401) unauthorizedHandler?.();
  if (!response.ok) throw await toApiError(response);
  return response.blob();
}

async function toApiError(response: Response): Promise<ApiError> {
  const fallback = defaultMessage(response.status);
  let body: unknown;
  try {
    body = await response.json();
  } catch {
    return new ApiError(response.status, `http-${response.status}`, fallback);
  }
  const error = (body as { error?: Record<string, unknown> } | null)?.error;
  if (!error || typeof error !== 'object') return new ApiError(response.status, `http-${response.status}`, fallback);
  const code = typeof error.code === 'string' ? error.code : `http-${response.status}`;
  const message = typeof error.message === 'string' && error.message !== '' ? error.message : fallback;
  return new ApiError(response.status, code, message, readFields(error.fields));
}

function readFields(value: unknown): FieldErrors {
  if (!value || typeof value !== 'object') return {};
  const fields: FieldErrors = {};
  for (const [key, message] of Object.entries(value as Record<string, unknown>)) {
    if (typeof message === 'string') fields[key] = message;
    else if (Array.isArray(message) && typeof message[0] === 'string') fields[key] = message[0];
  }
  return fields;
}

function defaultMessage(status: number): string {
  if (status === 401) return 'Please sign in.';
  if (status === 403) return 'Your role does not allow this.';
  if (status === 404) return 'Not found.';
  if (status === 429) return 'Too many attempts. Wait a little and try again.';
  if (status >= 500) return 'The server had a problem. Please try again shortly.';
  return 'The request was not accepted.';
}
