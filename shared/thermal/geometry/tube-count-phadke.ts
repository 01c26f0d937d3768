/**
 * Phadke's tube count: the number of tubes a bundle of outer tube limit D_otl holds, for 1, 2 or 4
 * tube passes, from the count of lattice points in a circle less the rows the pass lanes take out.
 * An independent check of the drawn layout (./layout.ts); the sizing never uses it.
 *
 * Reference: P. S. Phadke, "Determining tube counts for shell and tube exchangers", *Chemical
 * Engineering* 91 (September 1984) 65–68. Equations (memory), in the form restated by the
 * open-source `ht` library (`Ntubes_Phadkeb`):
 * - r = (D_otl − d_o)/(2 p) (the tube centre limit in pitches), s = r², N_r = ⌊r⌋;
 * - C1 = the lattice points (one on the axis) with norm ≤ ⌊s⌋: a² + ab + b² for the triangular
 *   lattices (30°, 60°), a² + b² for the square ones (90°, 45°). Phadke tabulates these counts;
 *   they are counted here, which gives the same numbers;
 * - C_x = 2N_r + 1 (the row on the horizontal axis);
 * - triangular: N_w = ⌊2r/√3⌋, C_y = 3N_w (N_w even) or 3N_w + 1 (odd); 2 passes: C1 − C_x (30°),
 *   C1 − C_y − 1 (60°); 4 passes: C1 − C_x − C_y;
 * - square (90°): C_y = C_x − 1; 2 passes C1 − C_x; 4 passes C1 − C_x − C_y;
 * - rotated square (45°): N_w = ⌊r/√2⌋, C_x = 2N_w + 1, C_y = C_x − 1; then as the square.
 * Validity: 1, 2 and 4 passes here (the paper also has 6 and 8); each lane takes out one lattice row
 * (a lane as wide as one row pitch), no tie rods, no impingement space.
 */
import type { Layout } from './layout';

function latticeCount(norm: number, triangular: boolean): number {
  const m = Math.ceil(Math.sqrt(norm)) + 2;
  let c = 0;
  for (let a = -2 * m; a <= 2 * m; a++) {
    for (let b = -2 * m; b <= 2 * m; b++) if ((triangular ? a * a + a * b + b * b : a * a + b * b) <= norm) c++;
  }
  return c;
}

/** Phadke's tube count for outer tube limit `dOtl` (m), tube OD, pitch (m), 1, 2 or 4 passes and a layout angle. */
export function tubeCountPhadke(dOtl: number, dOuter: number, pitch: number, passes: 1 | 2 | 4, layout: Layout): number {
  const r = (0.5 * (dOtl - dOuter)) / pitch;
  const s = r * r;
  const triangular = layout === 30 || layout === 60;
  const c1 = latticeCount(Math.floor(s + 1e-9), triangular);
  if (passes === 1) return c1;
  let cx = 2 * Math.floor(r) + 1;
  let cy: number;
  if (triangular) {
    const nw = Math.floor((2 * r) / Math.sqrt(3));
    cy = nw % 2 === 0 ? 3 * nw : 3 * nw + 1;
    if (passes === 2) return layout === 30 ? c1 - cx : c1 - cy - 1;
    return c1 - cx - cy;
  }
  if (layout === 45) cx = 2 * Math.floor(r / Math.SQRT2) + 1;
  cy = cx - 1;
  return passes === 2 ? c1 - cx : c1 - cx - cy;
}
