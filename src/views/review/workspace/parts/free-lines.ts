/** Drafts of the lines a sales engineer adds to the order, to and from the saved price. */
import { FREE_LINE_MAX_MINOR, type FreeLine } from '@shared/schemas/quotes';
import type { Price } from '@shared/schemas/price-book';
import { toMajor, toMinor } from '../../../../composables/use-review-money';

export type FreeLineDraft = { kind: FreeLine['kind']; description: string; amount: number | null; reason: string };

/** What the price tab saves: all overrides and all added lines (each list replaces the saved one). */
export type PriceSave = { priceOverrides: { key: string; amount_minor: number; reason: string }[]; freeLines: FreeLine[] };

export const FREE_LINE_MAX_MAJOR = FREE_LINE_MAX_MINOR / 100;

/** The saved price's added lines as drafts. */
export function draftsOf(price: Price): FreeLineDraft[] {
  return price.lines
    .filter((l) => l.group === 'extra' && l.added)
    .map((l) => ({ kind: l.added!.kind as FreeLine['kind'], description: l.added!.description ?? '', amount: toMajor(l.amount_minor), reason: l.added!.reason }));
}

/** The first problem of a draft, shown under it (the server refuses the same with a 400). */
export function draftProblem(d: FreeLineDraft, currency: string): string | null {
  if (d.amount === null || d.amount <= 0) return 'Enter an amount above 0.';
  if (d.amount > FREE_LINE_MAX_MAJOR) return `At most ${FREE_LINE_MAX_MAJOR.toLocaleString('en-GB')} ${currency}.`;
  if (d.kind === 'other' && !d.description.trim()) return 'Describe an "other" line for the customer.';
  if (d.reason.trim().length < 3) return 'Say why the line is added.';
  return null;
}

/** Drafts → the request's `freeLines`. */
export function toFreeLines(drafts: FreeLineDraft[]): FreeLine[] {
  return drafts.map((d) => ({
    kind: d.kind,
    ...(d.description.trim() ? { description: d.description.trim() } : {}),
    amount_minor: toMinor(d.amount ?? 0),
    reason: d.reason.trim(),
  }));
}

/** A comparable key of a set of lines (to tell unsaved changes). */
export const linesKey = (lines: FreeLine[]) => lines.map((l) => `${l.kind}|${l.description ?? ''}|${l.amount_minor}|${l.reason}`).join('\n');
