/**
 * Free text typed by people (messages, notes, references, names, addresses). Control characters
 * have no place in it: a NUL cannot even be stored in a PostgreSQL text column, and the others
 * garble e-mails, PDFs and CSV exports. Tab, line feed and carriage return stay allowed.
 */
import { z } from 'zod';

/** C0 controls except \t \n \r, and DEL (U+007F). */
const CONTROL_CHARACTER = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

export const CONTROL_CHARACTER_MESSAGE = 'contains a control character';

export const hasControlCharacter = (value: string): boolean => CONTROL_CHARACTER.test(value);

/**
 * `z.string(params)` that refuses control characters (400 naming the field). The check runs first,
 * so chain `.trim()`, `.min()` and `.max()` after it as usual.
 */
export function plainText(params?: Parameters<typeof z.string>[0]) {
  return z.string(params).refine((value) => !hasControlCharacter(value), { error: CONTROL_CHARACTER_MESSAGE });
}
