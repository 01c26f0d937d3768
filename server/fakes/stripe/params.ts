import { z } from 'zod';
import { badParam } from './errors';

/**
 * Form-encoded parameters as the SDK sends them (`metadata[quote]=…`, `amount=1000`), parsed with zod
 * and refused in Stripe's words: a missing, unknown or malformed parameter is a 400 naming `param`,
 * so a typo in the app's call fails here as it would against Stripe instead of being ignored.
 */
export const integer = (min: number, max = 99_999_999) =>
  z.string().regex(/^-?\d+$/, 'Invalid integer').transform(Number).pipe(z.number().int().min(min).max(max));

export const currency = z.string().regex(/^[a-zA-Z]{3}$/, 'Invalid currency').transform((c) => c.toLowerCase());

export const boolean = z.enum(['true', 'false']).transform((v) => v === 'true');

/** Stripe's limits: 50 keys, keys up to 40 characters, values up to 500. Empty values are dropped. */
export const metadata = z
  .record(z.string().max(40), z.string().max(500))
  .refine((m) => Object.keys(m).length <= 50, 'Metadata may have at most 50 keys')
  .transform((m) => Object.fromEntries(Object.entries(m).filter(([, v]) => v !== '')));

/** `expand` is accepted everywhere and, where it matters, honoured by the route. */
export const expand = z.array(z.string()).optional();

const pathOf = (path: PropertyKey[]) =>
  path.map((p, i) => (i === 0 ? String(p) : `[${String(p)}]`)).join('');

const valueAt = (body: unknown, path: PropertyKey[]): unknown =>
  path.reduce<unknown>((v, key) => (v && typeof v === 'object' ? (v as Record<PropertyKey, unknown>)[key] : undefined), body);

export function parseParams<S extends z.ZodType>(schema: S, body: unknown): z.output<S> {
  const result = schema.safeParse(body ?? {});
  if (result.success) return result.data;
  const issue = result.error.issues[0]!;
  if (issue.code === 'unrecognized_keys') {
    const key = [...issue.path, issue.keys[0]!];
    throw badParam(`Received unknown parameter: ${pathOf(key)}`, pathOf(key), 'parameter_unknown');
  }
  const param = pathOf(issue.path);
  if (valueAt(body, issue.path) === undefined) {
    throw badParam(`Missing required param: ${param}.`, param, 'parameter_missing');
  }
  const code = issue.message === 'Invalid integer' ? 'parameter_invalid_integer' : undefined;
  throw badParam(`Invalid ${param}: ${issue.message}`, param, code);
}
