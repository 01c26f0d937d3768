/**
 * Tube layout speed (issue 11): milliseconds to lay out every shell of the standard ladder (NPS 4 to
 * 1.5 m) for 5/8, 3/4, 1 in and 16, 20, 25 mm tubes, four layouts, 1, 2 and 4 passes, with TEMA's
 * tie rods placed in free room (uncached: each key once), and the largest single layout.
 * Prints figures; asserts nothing. `npx tsx tests/bench/tube-layout.ts`.
 */
import { STANDARD_SHELLS } from '../../shared/thermal/geometry/shells';
import { tubeLayout } from '../../shared/thermal/geometry/layout';

const IN = 0.0254;
let n = 0;
let worst = 0;
const t0 = performance.now();
for (const sh of STANDARD_SHELLS) {
  for (const od of [0.625 * IN, 0.75 * IN, IN, 0.016, 0.02, 0.025]) {
    for (const layout of [30, 60, 90, 45] as const) {
      for (const passes of [1, 2, 4]) {
        const t = performance.now();
        tubeLayout({ shellInnerDiameter_m: sh.innerDiameter_m, tubeOuterDiameter_m: od, tubePitch_m: 1.25 * od, layout, tubePasses: passes });
        worst = Math.max(worst, performance.now() - t);
        n++;
      }
    }
  }
}
const total = performance.now() - t0;
console.log(`tube layouts with tie rods: ${n} layouts in ${total.toFixed(0)} ms (mean ${(total / n).toFixed(2)} ms, largest ${worst.toFixed(1)} ms)`);
