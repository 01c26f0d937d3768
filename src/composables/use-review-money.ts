/**
 * Money for the review pages and the price book: integer minor units on the wire, the currency's
 * symbol on screen, major units in inputs (so a person types 12.50, not 1250).
 */
/** "€12,340.00" from 1234000 minor units of EUR, as on every page, PDF and e-mail (shared/format.ts). */
export { formatMoney } from '@shared/format';

export const toMajor = (minor: number): number => minor / 100;
/** Major units typed by a person → integer minor units (rounded to the cent). */
export const toMinor = (major: number): number => Math.round(major * 100);
