import type { ZodType } from 'zod';
import { badRequest, zodFields } from './errors';

/** Parse a request part with a shared zod schema; a failure is a 400 naming each bad field. */
export function parse<T>(schema: ZodType<T>, value: unknown, what = 'request body'): T {
  const result = schema.safeParse(value ?? {});
  if (result.success) return result.data;
  const fields = zodFields(result.error);
  const [first] = Object.entries(fields);
  throw badRequest(first ? `Invalid ${what}: ${first[0]}: ${first[1]}` : `Invalid ${what}.`, fields);
}
