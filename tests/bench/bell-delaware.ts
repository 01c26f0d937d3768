/**
 * Bell–Delaware speed (issue 10: ≤ 40 µs per shell-side rating): median µs of one
 * `shellSideBellDelaware` call on a prepared geometry, and of `prepareBellDelaware`. Prints figures;
 * asserts nothing. `npx tsx tests/bench/bell-delaware.ts`.
 */
import { prepareBellDelaware, shellSideBellDelaware } from '../../shared/thermal/exchanger/bell-delaware';
import { oilVg46 } from '../../shared/thermal/fluids';

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function timeUs(f: (i: number) => void, batch: number, rounds: number): number {
  for (let i = 0; i < batch; i++) f(i);
  const per: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) f(i);
    per.push(((performance.now() - t0) * 1000) / batch);
  }
  return median(per);
}

export function run(): Record<string, number> {
  const shell = { dShell: 0.3874, dOuter: 0.01905, pitch: 0.0238, layout: 30 as const, tubeCount: 180, tubePasses: 2, tubeLength: 3, baffleSpacing: 0.17, baffleCut: 0.25 };
  const p = prepareBellDelaware(shell);
  const bulk = oilVg46.properties(55, 3e5);
  const muWall = oilVg46.properties(35, 3e5).viscosity;
  let sink = 0;
  // vary the flow so Re crosses the table rows and the laminar branch
  const rateUs = timeUs((i) => { sink += shellSideBellDelaware(p, 0.5 + (i % 64) * 0.2, bulk, muWall).h; }, 20000, 21);
  const prepareUs = timeUs((i) => { sink += prepareBellDelaware({ ...shell, baffleSpacing: 0.1 + (i % 32) * 0.01 }).jl; }, 5000, 21);
  if (!Number.isFinite(sink)) console.log('unexpected non-finite result');
  console.log(`Bell–Delaware shell side, one call:       median ${rateUs.toFixed(2)} µs (target ≤ 40 µs); prepareBellDelaware ${prepareUs.toFixed(2)} µs`);
  return { bellDelawareUs: rateUs, bellDelawarePrepareUs: prepareUs };
}

if (process.argv[1]?.endsWith('bell-delaware.ts')) run();
