/**
 * Which sized designs are worth reading: distinct designs only (near-copies that differ in layout
 * angle, wall gauge or material at the same side, shells, passes, OD, count, shell and length
 * collapse to the best-ranked), spanning the trade-offs: the best per allocation and per number
 * of shells, the lowest tube ΔP, the lowest shell ΔP, the shortest, and the Pareto set over
 * (cost, tube ΔP, shell ΔP, length).
 */

export interface Pickable {
  rank: number;
  cost: number;
  side: string;
  shells: number;
  tubeDp: number;
  shellDp: number;
  length: number;
  key: string;
}

/** The identity of a design for de-duplication (layout, wall and material left out on purpose). */
export function distinctKey(d: { processSide?: string; shellsInSeries?: number; tubePasses: number; tubeOuterDiameter_m: number; tubeCount: number; shellInnerDiameter_m?: number; tubeLength_m: number }): string {
  return [d.processSide ?? 'tubes', d.shellsInSeries ?? 1, d.tubePasses, Math.round(d.tubeOuterDiameter_m * 1000), d.tubeCount, Math.round((d.shellInnerDiameter_m ?? 0) * 1000), Math.round(d.tubeLength_m * 1000)].join('|');
}

/** Keeps the best-ranked item of each key; the result is sorted by rank. */
export function distinct<T extends { rank: number; key: string }>(xs: T[]): T[] {
  const best = new Map<string, T>();
  for (const x of xs) {
    const b = best.get(x.key);
    if (!b || x.rank < b.rank) best.set(x.key, x);
  }
  return [...best.values()].sort((a, b) => a.rank - b.rank);
}

const dominates = (a: Pickable, b: Pickable) =>
  a.cost <= b.cost && a.tubeDp <= b.tubeDp && a.shellDp <= b.shellDp && a.length <= b.length &&
  (a.cost < b.cost || a.tubeDp < b.tubeDp || a.shellDp < b.shellDp || a.length < b.length);

/**
 * Non-dominated items over (cost, tube ΔP, shell ΔP, length), in cost order. Sorted by cost, an item
 * is dominated only by one before it, and then by one already on the front (dominance is
 * transitive), so each item is checked against the front alone.
 */
export function pareto<T extends Pickable>(xs: T[]): T[] {
  const order = [...xs].sort((a, b) => a.cost - b.cost || a.tubeDp - b.tubeDp || a.shellDp - b.shellDp || a.length - b.length);
  const front: T[] = [];
  for (const x of order) if (!front.some((y) => dominates(y, x))) front.push(x);
  return front;
}

/**
 * The spanning set, recommended (lowest rank) first, at most `max` items, no key twice. `perBucket`
 * takes that many of the best per allocation × shells (the search rates these).
 */
export function spanning<T extends Pickable>(sorted: T[], max: number, perBucket = 1): T[] {
  const out: T[] = [];
  const seen = new Set<string>();
  const add = (x: T | undefined) => {
    if (x && !seen.has(x.key) && out.length < max) {
      seen.add(x.key);
      out.push(x);
    }
  };
  const minBy = (f: (x: T) => number) => sorted.reduce<T | undefined>((m, x) => (m === undefined || f(x) < f(m) ? x : m), undefined);
  add(sorted[0]);
  const buckets = new Map<string, number>();
  for (const x of sorted) {
    const k = `${x.side}|${x.shells}`;
    const n = buckets.get(k) ?? 0;
    if (n < perBucket) {
      buckets.set(k, n + 1);
      add(x);
    }
  }
  for (const side of new Set(sorted.map((x) => x.side))) add(sorted.find((x) => x.side === side));
  for (const n of new Set(sorted.map((x) => x.shells))) add(sorted.find((x) => x.shells === n));
  add(minBy((x) => x.tubeDp));
  add(minBy((x) => x.shellDp));
  add(minBy((x) => x.length));
  for (const x of pareto(sorted)) add(x);
  return out;
}
