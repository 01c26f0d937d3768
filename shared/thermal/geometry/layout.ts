/**
 * Tube hole centres in a tubesheet: a lattice laid inside the outer tube limit (OTL), less the
 * pass-partition lanes and the tie rods. The shop's drilling pattern and the tube count both come
 * from here. Deterministic; results are cached per (shell, OD, pitch, layout, passes) in a bounded
 * LRU cache.
 */
import { LRUCache } from 'lru-cache';
import { bundleClearance, tieRodCount } from './shells';

/** Tube layout angles (TEMA): 30° triangular, 60° rotated triangular, 90° square, 45° rotated square. */
export const LAYOUTS = [30, 60, 90, 45] as const;
export type Layout = (typeof LAYOUTS)[number];

export function pitchFamily(layout: Layout): 'triangular' | 'square' {
  return layout === 30 || layout === 60 ? 'triangular' : 'square';
}

/** Clear width between tube walls across a pass-partition lane, m (common practice, ~5/8 in). */
export const PASS_LANE_CLEARANCE_M = 0.016;

export interface TubeLayoutKey {
  shellInnerDiameter_m: number;
  tubeOuterDiameter_m: number;
  tubePitch_m: number;
  layout: Layout;
  tubePasses: number;
}

export interface TubeLayout {
  /** hole centres, m, origin at the shell axis; x horizontal, y vertical */
  x: Float64Array;
  y: Float64Array;
  /** 1 where the hole takes a tie rod instead of a tube */
  tieRod: Uint8Array;
  /** the pass-partition region of each hole (0 … passes−1) */
  region: Uint8Array;
  tubeCount: number;
  outerTubeLimit_m: number;
}

/** Lattice basis vectors for a layout at pitch p. */
function basis(layout: Layout, p: number): [number, number, number, number] {
  const h = (Math.sqrt(3) / 2) * p;
  const r = p / Math.SQRT2;
  switch (layout) {
    case 30: return [p, 0, p / 2, h];
    case 60: return [0, p, h, p / 2];
    case 90: return [p, 0, 0, p];
    case 45: return [r, r, -r, r];
  }
}

/** Horizontal and vertical partition lanes for 1, 2, 4, 6, 8 passes (ribbon bands × halves). */
function lanes(passes: number): { bands: number; halves: number } {
  if (passes <= 1) return { bands: 1, halves: 1 };
  if (passes === 2) return { bands: 2, halves: 1 };
  return { bands: passes / 2, halves: 2 };
}

function layOut(k: TubeLayoutKey, ox: number, oy: number): { x: number[]; y: number[]; region: number[] } {
  const d = k.tubeOuterDiameter_m;
  const otl = k.shellInnerDiameter_m - bundleClearance(k.shellInnerDiameter_m);
  const rMax = otl / 2 - d / 2;
  const [ax, ay, bx, by] = basis(k.layout, k.tubePitch_m);
  const { bands, halves } = lanes(k.tubePasses);
  const laneHalf = (PASS_LANE_CLEARANCE_M + d) / 2;
  const laneY: number[] = [];
  for (let b = 1; b < bands; b++) laneY.push(-otl / 2 + (otl * b) / bands);
  const n = Math.ceil(otl / k.tubePitch_m) + 2;
  const x: number[] = [];
  const y: number[] = [];
  const region: number[] = [];
  for (let i = -n; i <= n; i++) {
    for (let j = -n; j <= n; j++) {
      const px = ox + i * ax + j * bx;
      const py = oy + i * ay + j * by;
      if (px * px + py * py > rMax * rMax) continue;
      if (halves === 2 && Math.abs(px) < laneHalf) continue;
      let band = 0;
      let inLane = false;
      for (const ly of laneY) {
        if (Math.abs(py - ly) < laneHalf) inLane = true;
        if (py > ly) band++;
      }
      if (inLane) continue;
      x.push(px);
      y.push(py);
      region.push(band * halves + (halves === 2 && px > 0 ? 1 : 0));
    }
  }
  return { x, y, region };
}

/** Marks the outermost holes nearest to evenly spaced angles as tie rods. */
function pickTieRods(x: number[], y: number[], count: number): Uint8Array {
  const tie = new Uint8Array(x.length);
  let rOuter = 0;
  for (let i = 0; i < x.length; i++) rOuter = Math.max(rOuter, Math.hypot(x[i]!, y[i]!));
  for (let t = 0; t < count && t < x.length; t++) {
    const want = (2 * Math.PI * (t + 0.5)) / count;
    let best = -1;
    let bestScore = Infinity;
    for (let i = 0; i < x.length; i++) {
      if (tie[i]) continue;
      const r = Math.hypot(x[i]!, y[i]!);
      let da = Math.abs(Math.atan2(y[i]!, x[i]!) - want + 2 * Math.PI) % (2 * Math.PI);
      da = Math.min(da, 2 * Math.PI - da);
      const score = da * rOuter + 4 * (rOuter - r);
      if (score < bestScore) { bestScore = score; best = i; }
    }
    if (best >= 0) tie[best] = 1;
  }
  return tie;
}

/**
 * Layouts already computed, least recently used dropped first. Bounded by count and by bytes (a
 * 2.5 m shell of 3/8 in tubes is ~40,000 holes, 0.7 MB), so no stream of distinct requests grows
 * the process without end (issue 9). 4,000 holds every layout of several full default searches.
 */
export const LAYOUT_CACHE_MAX = 4000;
/** 128 MiB of hole arrays at most */
export const LAYOUT_CACHE_MAX_BYTES = 128 * 1024 * 1024;
const cache = new LRUCache<string, TubeLayout>({
  max: LAYOUT_CACHE_MAX,
  maxSize: LAYOUT_CACHE_MAX_BYTES,
  sizeCalculation: (l) => l.x.byteLength + l.y.byteLength + l.tieRod.byteLength + l.region.byteLength + 64,
});

const cacheKey = (k: TubeLayoutKey) => `${k.shellInnerDiameter_m}|${k.tubeOuterDiameter_m}|${k.tubePitch_m}|${k.layout}|${k.tubePasses}`;

/** Layouts held in the cache now (for tests and diagnostics). */
export function layoutCacheSize(): number {
  return cache.size;
}

/**
 * Lays out the hole centres. Four lattice offsets (0 or half a basis step in each direction) are
 * tried and the one holding most holes kept (ties: the first), so the result is deterministic.
 */
export function tubeLayout(k: TubeLayoutKey): TubeLayout {
  const key = cacheKey(k);
  const hit = cache.get(key);
  if (hit) return hit;
  const [ax, ay, bx, by] = basis(k.layout, k.tubePitch_m);
  let best = layOut(k, 0, 0);
  for (const [s, t] of [[0.5, 0], [0, 0.5], [0.5, 0.5]] as const) {
    const trial = layOut(k, s * ax + t * bx, s * ay + t * by);
    if (trial.x.length > best.x.length) best = trial;
  }
  const otl = k.shellInnerDiameter_m - bundleClearance(k.shellInnerDiameter_m);
  const tieRod = pickTieRods(best.x, best.y, tieRodCount(k.shellInnerDiameter_m));
  let ties = 0;
  for (const v of tieRod) ties += v;
  const result: TubeLayout = {
    x: Float64Array.from(best.x),
    y: Float64Array.from(best.y),
    tieRod,
    region: Uint8Array.from(best.region),
    tubeCount: Math.max(0, best.x.length - ties),
    outerTubeLimit_m: otl,
  };
  cache.set(key, result);
  return result;
}

/** Number of tubes the shell holds for this OD, pitch, layout and pass count. */
export function tubeCountInShell(k: TubeLayoutKey): number {
  return tubeLayout(k).tubeCount;
}
