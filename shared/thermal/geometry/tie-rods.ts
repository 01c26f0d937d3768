/**
 * Tie rods: how many and how thick (TEMA's table by shell size), and where they go in a tubesheet
 * so that they cost the fewest tubes: in the free space at the bundle's edge (between the outer
 * tube limit and the baffle's rim) or in a pass-partition lane, spread around the bundle so every
 * baffle is held; a tube hole is given up only where no free position exists in a rod's sector.
 */

const INCH = 0.0254;

/**
 * Minimum tie-rod count and diameter by nominal shell diameter, TEMA RCB-4.71, class R column
 * (*Standards of the Tubular Exchanger Manufacturers Association*, memory; confirm against the
 * edition in force). Classes C and B allow 1/4 in rods in 6–15 in shells; the R column (3/8 in) is
 * used for every class here, the heavier choice. [largest nominal shell, in; rods; rod diameter, in]
 */
export const TEMA_TIE_RODS: readonly [number, number, number][] = [
  [15, 4, 0.375], [27, 6, 0.375], [33, 6, 0.5], [48, 8, 0.5], [60, 10, 0.5], [100, 12, 0.625],
];

export interface TieRods {
  count: number;
  diameter_m: number;
}

/**
 * TEMA's tie rods for a shell. The nominal size is the shell's inside diameter rounded to the
 * nearest inch (TEMA's size designation, memory): an NPS 16 STD pipe (ID 15.25 in) is a 15 in shell.
 */
export function temaTieRods(shellInnerDiameter_m: number): TieRods {
  const nominal = Math.round(shellInnerDiameter_m / INCH);
  const row = TEMA_TIE_RODS.find((r) => nominal <= r[0]) ?? TEMA_TIE_RODS[TEMA_TIE_RODS.length - 1]!;
  return { count: row[1], diameter_m: row[2] * INCH };
}

/** Least metal between a tie-rod hole and a tube hole or the baffle's rim, m (common practice, ~1/8 in). */
export const TIE_ROD_LIGAMENT_M = 0.003;

export interface TieRodField {
  /** tube hole centres, m */
  x: readonly number[];
  y: readonly number[];
  tubeOuterDiameter_m: number;
  tubePitch_m: number;
  rod: TieRods;
  /** largest radius of a rod's centre, m (the baffle's rim less the rod's radius and a ligament) */
  rEdge_m: number;
  /** centre lines of the pass-partition lanes: horizontal lanes at y = value, vertical at x = value */
  laneY: readonly number[];
  laneX: readonly number[];
}

export interface TieRodPlacement {
  /** rod centres, m */
  x: number[];
  y: number[];
  /** indices of the tube holes the rods displace (empty when every rod found free room) */
  displaced: number[];
}

/**
 * Places the rods. Each rod t of n owns the angular sector centred on 2π(t + ½)/n; within it the
 * candidates are points on rings from the edge radius inwards (1.5 pitches deep, a quarter pitch apart), points on the
 * lane centre lines, and the tube hole centres themselves. A candidate's cost is the number of tube
 * holes closer than (d_o + d_rod)/2 + ligament; the least cost wins, then the smallest of
 * |Δθ|·r_edge + 2(r_edge − r) (near its sector's centre, near the rim, where it holds the baffles
 * best). Rods keep a rod diameter plus a ligament between them. Deterministic.
 */
export function placeTieRods(f: TieRodField): TieRodPlacement {
  const n = f.rod.count;
  const d = f.tubeOuterDiameter_m;
  const dr = f.rod.diameter_m;
  const clear = (d + dr) / 2 + TIE_ROD_LIGAMENT_M;
  const rodClear = dr + TIE_ROD_LIGAMENT_M;
  // grid hash of the tube holes, cell = clear
  const cell = clear;
  const grid = new Map<number, number[]>();
  const keyOf = (i: number, j: number) => i * 65536 + j;
  for (let k = 0; k < f.x.length; k++) {
    const key = keyOf(Math.floor(f.x[k]! / cell), Math.floor(f.y[k]! / cell));
    const list = grid.get(key);
    if (list) list.push(k);
    else grid.set(key, [k]);
  }
  const displaced = new Set<number>();
  const conflicts = (px: number, py: number): number[] => {
    const ci = Math.floor(px / cell);
    const cj = Math.floor(py / cell);
    const out: number[] = [];
    for (let a = ci - 1; a <= ci + 1; a++) {
      for (let b = cj - 1; b <= cj + 1; b++) {
        for (const k of grid.get(keyOf(a, b)) ?? []) {
          if (!displaced.has(k) && Math.hypot(f.x[k]! - px, f.y[k]! - py) < clear - 1e-9) out.push(k);
        }
      }
    }
    return out;
  };
  const free0 = (px: number, py: number): boolean => {
    const ci = Math.floor(px / cell);
    const cj = Math.floor(py / cell);
    for (let a = ci - 1; a <= ci + 1; a++) {
      for (let b = cj - 1; b <= cj + 1; b++) {
        const list = grid.get(keyOf(a, b));
        if (!list) continue;
        for (const k of list) if (!displaced.has(k) && Math.hypot(f.x[k]! - px, f.y[k]! - py) < clear - 1e-9) return false;
      }
    }
    return true;
  };
  // candidates bucketed by the rod sector they fall in: free room on rings at the rim and on the
  // lane centre lines; the tube holes themselves only when a sector has no free room
  const rEdge = Math.max(0, f.rEdge_m);
  const step = f.tubePitch_m / 4;
  const sectorOf = (px: number, py: number) => {
    const a = (Math.atan2(py, px) + 2 * Math.PI) % (2 * Math.PI);
    return Math.floor((a / (2 * Math.PI)) * n) % n;
  };
  type Cand = { px: number; py: number; score: number };
  const bucket = (list: [number, number][]) => {
    const out: Cand[][] = Array.from({ length: n }, () => []);
    for (const [px, py] of list) {
      const t = sectorOf(px, py);
      const want = (2 * Math.PI * (t + 0.5)) / n;
      let da = Math.abs(Math.atan2(py, px) - want) % (2 * Math.PI);
      da = Math.min(da, 2 * Math.PI - da);
      out[t]!.push({ px, py, score: da * rEdge + 2 * (rEdge - Math.hypot(px, py)) });
    }
    for (const b of out) b.sort((a, c) => a.score - c.score);
    return out;
  };
  const free: [number, number][] = [];
  for (let r = rEdge; r > rEdge - 1.5 * f.tubePitch_m && r > 0; r -= step) {
    const m = Math.max(8, Math.ceil((2 * Math.PI * r) / step));
    for (let k = 0; k < m; k++) free.push([r * Math.cos((2 * Math.PI * (k + 0.5)) / m), r * Math.sin((2 * Math.PI * (k + 0.5)) / m)]);
  }
  for (const ly of f.laneY) for (let s = -rEdge; s <= rEdge; s += step) if (s * s + ly * ly <= rEdge * rEdge) free.push([s, ly]);
  for (const lx of f.laneX) for (let s = -rEdge; s <= rEdge; s += step) if (s * s + lx * lx <= rEdge * rEdge) free.push([lx, s]);
  const freeBy = bucket(free);
  let holesBy: Cand[][] | undefined;

  const rx: number[] = [];
  const ry: number[] = [];
  const nearRod = (px: number, py: number) => rx.some((x, q) => Math.hypot(x - px, ry[q]! - py) < rodClear);
  for (let t = 0; t < n; t++) {
    // the best free position in the sector, if any
    let pick: { px: number; py: number; hits: number[] } | undefined;
    for (const c of freeBy[t]!) {
      if (nearRod(c.px, c.py)) continue;
      if (free0(c.px, c.py)) { pick = { px: c.px, py: c.py, hits: [] }; break; }
    }
    // else the position that displaces the fewest tube holes
    if (!pick) {
      holesBy ??= bucket(f.x.map((x, k) => [x, f.y[k]!] as [number, number]).filter(([x, y]) => Math.hypot(x, y) <= rEdge));
      let bestCost = Infinity;
      for (const c of [...freeBy[t]!, ...holesBy[t]!].sort((a, b) => a.score - b.score)) {
        if (nearRod(c.px, c.py)) continue;
        const hits = conflicts(c.px, c.py);
        if (hits.length < bestCost) { bestCost = hits.length; pick = { px: c.px, py: c.py, hits }; }
      }
    }
    if (!pick) continue;
    rx.push(pick.px);
    ry.push(pick.py);
    for (const k of pick.hits) displaced.add(k);
  }
  return { x: rx, y: ry, displaced: [...displaced].sort((a, b) => a - b) };
}
