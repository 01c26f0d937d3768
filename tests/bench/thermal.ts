/**
 * Thermal engine speed figures (issues 3 and 10): median µs of one rating (wall; coolant with
 * Bell–Delaware, the default, which also computes Kern's second opinion; Kern forced), median ms
 * of a typical sizing over the v2 space (both allocations, baffle spacings and cuts, shells in
 * series) and of the hydraulic-oil duty. Prints figures; asserts nothing.
 * `npx tsx tests/bench/thermal.ts`.
 */
import { rateParsed, size } from '../../shared/thermal';
import { rateRequestSchema } from '../../shared/schemas/thermal';

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

const geometry = { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 40, tubeLength_m: 3, tubePasses: 1, roughness_m: 1.5e-6, tubeMaterial: 'copper' as const };
const processWater = { fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85 };
const oil = { fluid: 'oil-vg46' as const, pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62 };
const coolant = { kind: 'coolant' as const, fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 20, foulingInside_m2K_W: 0.00018, foulingOutside_m2K_W: 0.00018 };

/** Median time per call over `rounds` batches of `batch` calls, µs. */
function timeUs(f: () => void, batch: number, rounds: number): number {
  for (let i = 0; i < batch; i++) f();
  const per: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) f();
    per.push(((performance.now() - t0) * 1000) / batch);
  }
  return median(per);
}

export function run(): Record<string, number> {
  const wallReq = rateRequestSchema.parse({ process: processWater, boundary: { kind: 'wall', wallTemp_C: 20 }, geometry });
  const coolReq = rateRequestSchema.parse({ process: processWater, boundary: coolant, geometry });
  const kernReq = rateRequestSchema.parse({ process: processWater, boundary: coolant, geometry, shellMethod: 'kern' });
  const oilShellReq = rateRequestSchema.parse({ process: oil, boundary: { ...coolant, massFlow_kg_s: 2, inletTemp_C: 27 }, geometry: { ...geometry, tubeCount: 68, tubePasses: 4, processSide: 'shell' } });
  const sizeReq = { process: { ...processWater, outletTemp_C: 40 }, boundary: coolant, constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 } };
  const oilReq = { process: { ...oil, outletTemp_C: 47 }, boundary: { kind: 'coolant' as const, fluid: 'water' as const, pressure_Pa: 350000, massFlow_kg_s: 2, inletTemp_C: 27 }, constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 } };
  const rateWallUs = timeUs(() => rateParsed(wallReq, { profilePoints: 0 }), 500, 21);
  const rateCoolantUs = timeUs(() => rateParsed(coolReq, { profilePoints: 0 }), 200, 21);
  const rateKernUs = timeUs(() => rateParsed(kernReq, { profilePoints: 0 }), 200, 21);
  const rateOilShellUs = timeUs(() => rateParsed(oilShellReq, { profilePoints: 0 }), 200, 21);
  const first = performance.now();
  const r = size(sizeReq);
  const firstMs = performance.now() - first;
  const sizeMs = timeUs(() => size(sizeReq), 1, 21) / 1000;
  const o = size(oilReq);
  const sizeOilMs = timeUs(() => size(oilReq), 1, 11) / 1000;
  const figures = { rateWallUs, rateCoolantUs, rateKernUs, rateOilShellUs, sizeMs, sizeOilMs, sizeFirstCallMs: firstMs, candidatesEvaluated: r.evaluated, candidatesFeasible: r.feasible };
  console.log(`rating, wall boundary (water):            median ${rateWallUs.toFixed(1)} µs`);
  console.log(`rating, coolant, Bell–Delaware + Kern:    median ${rateCoolantUs.toFixed(1)} µs (water/water)`);
  console.log(`rating, coolant, Kern forced:             median ${rateKernUs.toFixed(1)} µs (water/water)`);
  console.log(`rating, oil on the shell side (B–D):      median ${rateOilShellUs.toFixed(1)} µs`);
  console.log(`sizing, oil VG46 cooler (both sides):     median ${sizeOilMs.toFixed(1)} ms, ${o.evaluated} candidates solved, ${o.feasible} within limits`);
  console.log(`sizing, water/water cooler:               median ${sizeMs.toFixed(1)} ms, ${r.evaluated} candidates solved, ${r.feasible} within limits (first call ${firstMs.toFixed(0)} ms, tube layouts not yet cached)`);
  return figures;
}

if (process.argv[1]?.endsWith("thermal.ts")) run();
