/**
 * Tube hole centres in a tubesheet: a lattice laid inside the outer tube limit (OTL), less the
 * pass-partition lanes (and, when asked, the room under the shell inlet nozzle for an impingement
 * plate), with TEMA's tie rods placed where they cost the fewest tubes (./tie-rods.ts). The shop's
 * drilling pattern and the tube count both come from here. Deterministic; results are cached per
 * (shell, OD, pitch, layout, passes, room under the inlet) in a bounded LRU cache.
 */
import { LRUCache } from 'lru-cache';
import { shellToBaffleClearanceTema } from '../exchanger/tema-clearances';
import { bundleClearance } from './shells';
import { MIN_PITCH_RATIO } from './tubes';
import { TIE_ROD_LIGAMENT_M, placeTieRods, temaTieRods, type TieRods } from './tie-rods';

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
  /**
   * Room for an impingement plate under the shell inlet nozzle, m: tube holes whose tube comes
   * closer than this to the shell wall at the nozzle (the top, +y, where the shell inlet is drawn)
   * are left out across the whole chord. Default none.
   */
  clearUnderInlet_m?: number;
}

export interface TubeLayout {
  /** hole centres, m, origin at the shell axis; x horizontal, y vertical; tube holes first, then the tie rods */
  x: Float64Array;
  y: Float64Array;
  /** 1 where the hole takes a tie rod instead of a tube */
  tieRod: Uint8Array;
  /** the pass-partition region of each hole (0 … passes−1; 0 for a tie rod) */
  region: Uint8Array;
  tubeCount: number;
  outerTubeLimit_m: number;
  /** TEMA's tie rods for this shell (RCB-4.71, memory): count placed and rod diameter */
  tieRods: TieRods;
  /** tube holes the tie rods took because no free position was left in their sector (0 normally) */
  tubesDisplacedByTieRods: number;
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

function layOut(k: TubeLayoutKey, ox: number, oy: number): { x: number[]; y: number[]; region: number[]; laneY: number[]; laneX: number[] } {
  const d = k.tubeOuterDiameter_m;
  const otl = k.shellInnerDiameter_m - bundleClearance(k.shellInnerDiameter_m);
  const rMax = otl / 2 - d / 2;
  const [ax, ay, bx, by] = basis(k.layout, k.tubePitch_m);
  const { bands, halves } = lanes(k.tubePasses);
  const laneHalf = (PASS_LANE_CLEARANCE_M + d) / 2;
  const laneY: number[] = [];
  for (let b = 1; b < bands; b++) laneY.push(-otl / 2 + (otl * b) / bands);
  // the tube's top may come no nearer the shell wall at the inlet nozzle than clearUnderInlet_m
  const yTop = k.clearUnderInlet_m ? k.shellInnerDiameter_m / 2 - k.clearUnderInlet_m - d / 2 : Infinity;
  const n = Math.ceil(otl / k.tubePitch_m) + 2;
  const x: number[] = [];
  const y: number[] = [];
  const region: number[] = [];
  for (let i = -n; i <= n; i++) {
    for (let j = -n; j <= n; j++) {
      const px = ox + i * ax + j * bx;
      const py = oy + i * ay + j * by;
      if (px * px + py * py > rMax * rMax) continue;
      if (py > yTop) continue;
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
  return { x, y, region, laneY, laneX: halves === 2 ? [0] : [] };
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

const cacheKey = (k: TubeLayoutKey) => `${k.shellInnerDiameter_m}|${k.tubeOuterDiameter_m}|${k.tubePitch_m}|${k.layout}|${k.tubePasses}|${k.clearUnderInlet_m ?? 0}`;

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
  // tie rods: free room at the rim (inside the baffle, a ligament from its edge) or in a lane
  const rod = temaTieRods(k.shellInnerDiameter_m);
  const baffleRadius = (k.shellInnerDiameter_m - shellToBaffleClearanceTema(k.shellInnerDiameter_m)) / 2;
  const rods = placeTieRods({
    x: best.x, y: best.y, tubeOuterDiameter_m: k.tubeOuterDiameter_m, tubePitch_m: k.tubePitch_m, rod,
    rEdge_m: baffleRadius - rod.diameter_m / 2 - TIE_ROD_LIGAMENT_M, laneY: best.laneY, laneX: best.laneX,
  });
  const gone = new Set(rods.displaced);
  const keep = best.x.map((_, i) => i).filter((i) => !gone.has(i));
  const holes = keep.length + rods.x.length;
  const x = new Float64Array(holes);
  const y = new Float64Array(holes);
  const region = new Uint8Array(holes);
  const tieRod = new Uint8Array(holes);
  keep.forEach((i, n) => { x[n] = best.x[i]!; y[n] = best.y[i]!; region[n] = best.region[i]!; });
  rods.x.forEach((rx, t) => { x[keep.length + t] = rx; y[keep.length + t] = rods.y[t]!; tieRod[keep.length + t] = 1; });
  const result: TubeLayout = {
    x, y, tieRod, region,
    tubeCount: keep.length,
    outerTubeLimit_m: otl,
    tieRods: { count: rods.x.length, diameter_m: rod.diameter_m },
    tubesDisplacedByTieRods: gone.size,
  };
  cache.set(key, result);
  return result;
}

/** 6 mm: impingement plate thickness (common practice). */
export const IMPINGEMENT_PLATE_THICKNESS_M = 0.006;

/**
 * Room under a shell inlet nozzle of bore D_n for its impingement plate, m: the plate stands D_n/4
 * off the shell wall, so the escape area around it (π D_n · D_n/4) equals the nozzle's bore area,
 * plus the plate's thickness (common practice; TEMA RCB-4.6 asks for enough entrance area, memory).
 */
export function impingementClearance(nozzleBore_m: number): number {
  return nozzleBore_m / 4 + IMPINGEMENT_PLATE_THICKNESS_M;
}

/** Number of tubes the shell holds for this OD, pitch, layout and pass count. */
export function tubeCountInShell(k: TubeLayoutKey): number {
  return tubeLayout(k).tubeCount;
}

/**
 * The design record's tie rods: TEMA's count and diameter for its shell, as many as the layout
 * placed (`{}` for a design without a shell or layout).
 */
export function designTieRods(d: { shellInnerDiameter_m?: number; tubeOuterDiameter_m: number; tubePitch_m?: number; layout?: Layout; tubePasses: number }): { tieRods?: TieRods } {
  if (d.shellInnerDiameter_m === undefined || d.layout === undefined) return {};
  const pitch = d.tubePitch_m ?? MIN_PITCH_RATIO * d.tubeOuterDiameter_m;
  return { tieRods: tubeLayout({ shellInnerDiameter_m: d.shellInnerDiameter_m, tubeOuterDiameter_m: d.tubeOuterDiameter_m, tubePitch_m: pitch, layout: d.layout, tubePasses: d.tubePasses }).tieRods };
}
