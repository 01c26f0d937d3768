/**
 * Line-by-line difference of two price books: every leaf value (a rate, a label, a percentage) by
 * its dotted path, `tubes.3.perMetre_minor`. Rows are compared by position, as the editor shows them;
 * a row added or removed appears as its values with the missing side null.
 */
import type { PriceBookChange } from '../../../shared/schemas/price-book';

function leaves(value: unknown, path: string, out: Map<string, unknown>): Map<string, unknown> {
  if (value !== null && typeof value === 'object') {
    for (const [key, child] of Object.entries(value)) leaves(child, path ? `${path}.${key}` : key, out);
  } else {
    out.set(path, value);
  }
  return out;
}

export function diffPriceBooks(before: unknown, after: unknown): PriceBookChange[] {
  const a = leaves(before ?? {}, '', new Map());
  const b = leaves(after ?? {}, '', new Map());
  const changes: PriceBookChange[] = [];
  for (const [path, value] of a) {
    if (!b.has(path)) changes.push({ path, before: value, after: null });
    else if (b.get(path) !== value) changes.push({ path, before: value, after: b.get(path) });
  }
  for (const [path, value] of b) if (!a.has(path)) changes.push({ path, before: null, after: value });
  return changes.sort((x, y) => comparePaths(x.path, y.path));
}

/** Book order: by key, array indices numerically (`tubes.10` after `tubes.9`). */
function comparePaths(x: string, y: string): number {
  const xs = x.split('.');
  const ys = y.split('.');
  for (let i = 0; i < Math.min(xs.length, ys.length); i++) {
    if (xs[i] === ys[i]) continue;
    const xn = Number(xs[i]);
    const yn = Number(ys[i]);
    if (Number.isInteger(xn) && Number.isInteger(yn)) return xn - yn;
    return xs[i]! < ys[i]! ? -1 : 1;
  }
  return xs.length - ys.length;
}
