/** Heat-exchanger tube sizes: outside diameters and walls. */

const INCH = 0.0254;

/**
 * Birmingham Wire Gauge wall thickness, m. Inch values (BWG 10–22) as tabulated in TEMA,
 * *Standards*, 10th ed., Table D-7 (memory); checked against python3-fluids' `t_from_gauge(…,
 * schedule='BWG')` in tests/reference/fixtures/fluids-lib.json.
 */
export const BWG_WALL_M: Readonly<Record<number, number>> = {
  10: 0.134 * INCH,
  11: 0.12 * INCH,
  12: 0.109 * INCH,
  13: 0.095 * INCH,
  14: 0.083 * INCH,
  15: 0.072 * INCH,
  16: 0.065 * INCH,
  17: 0.058 * INCH,
  18: 0.049 * INCH,
  19: 0.042 * INCH,
  20: 0.035 * INCH,
  21: 0.032 * INCH,
  22: 0.028 * INCH,
};

export interface TubeWall {
  /** label shown to people: `BWG 16`, `1.5 mm` */
  label: string;
  wall_m: number;
}

export interface TubeSize {
  /** label shown to people: `3/4 in`, `20 mm` */
  label: string;
  outerDiameter_m: number;
  /** walls offered for this OD, thickest first */
  walls: TubeWall[];
}

const bwg = (gauges: number[]): TubeWall[] => gauges.map((g) => ({ label: `BWG ${g}`, wall_m: BWG_WALL_M[g]! }));
const mm = (walls: number[]): TubeWall[] => walls.map((w) => ({ label: `${w} mm`, wall_m: w / 1000 }));

/**
 * Tube sizes the search offers. Imperial ODs with BWG 14–20 are the common heat-exchanger tubes
 * (domain brief 2.5; common practice); metric 16/20/25 mm with mm walls as in EN 10216/10217 and
 * copper-alloy tube catalogues (common practice).
 */
export const TUBE_SIZES: readonly TubeSize[] = [
  { label: '3/8 in', outerDiameter_m: 0.375 * INCH, walls: bwg([18, 20, 22]) },
  { label: '1/2 in', outerDiameter_m: 0.5 * INCH, walls: bwg([16, 18, 20]) },
  { label: '5/8 in', outerDiameter_m: 0.625 * INCH, walls: bwg([14, 16, 18, 20]) },
  { label: '3/4 in', outerDiameter_m: 0.75 * INCH, walls: bwg([14, 16, 18, 20]) },
  { label: '1 in', outerDiameter_m: 1 * INCH, walls: bwg([12, 14, 16, 18]) },
  { label: '1 1/4 in', outerDiameter_m: 1.25 * INCH, walls: bwg([12, 14, 16]) },
  { label: '16 mm', outerDiameter_m: 0.016, walls: mm([1.5, 1.2, 1]) },
  { label: '20 mm', outerDiameter_m: 0.02, walls: mm([2, 1.5, 1.2]) },
  { label: '25 mm', outerDiameter_m: 0.025, walls: mm([2.5, 2, 1.5]) },
];

/** ODs the sizing search uses unless the request narrows them: 5/8, 3/4, 1 in and 16, 20, 25 mm. */
export const DEFAULT_SEARCH_ODS_M = [0.625 * INCH, 0.75 * INCH, 1 * INCH, 0.016, 0.02, 0.025];

/** The catalogue entry whose OD is within 0.05 mm of `outerDiameter_m`, if any. */
export function tubeSizeOf(outerDiameter_m: number): TubeSize | undefined {
  return TUBE_SIZES.find((t) => Math.abs(t.outerDiameter_m - outerDiameter_m) < 5e-5);
}

/** 1.25: TEMA minimum tube pitch / OD ratio, RCB-2.5 (memory). */
export const MIN_PITCH_RATIO = 1.25;
