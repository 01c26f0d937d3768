/**
 * Thermal engine speed figures (issue 3): median µs of one rating, median ms of a typical sizing
 * with its candidate count. Prints figures; asserts nothing. `npx tsx tests/bench/thermal.ts`.
 */
import { rateParsed, size } from '../../shared/thermal';
import { rateRequestSchema } from '../../shared/schemas/thermal';

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

const geometry = { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 40, tubeLength_m: 3, tubePasses: 1, roughness_m: 1.5e-6, tubeMaterial: 'copper' as const };
const processWater = { fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85 };
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
  const sizeReq = { process: { ...processWater, outletTemp_C: 40 }, boundary: coolant, constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 } };
  const rateWallUs = timeUs(() => rateParsed(wallReq, { profilePoints: 0 }), 500, 21);
  const rateCoolantUs = timeUs(() => rateParsed(coolReq, { profilePoints: 0 }), 200, 21);
  const first = performance.now();
  const r = size(sizeReq);
  const firstMs = performance.now() - first;
  const sizeMs = timeUs(() => size(sizeReq), 1, 21) / 1000;
  const figures = { rateWallUs, rateCoolantUs, sizeMs, sizeFirstCallMs: firstMs, candidatesEvaluated: r.evaluated, candidatesFeasible: r.feasible };
  console.log(`rating, wall boundary (water):            median ${rateWallUs.toFixed(1)} µs`);
  console.log(`rating, shell-side coolant (water/water): median ${rateCoolantUs.toFixed(1)} µs`);
  console.log(`sizing, water/water cooler:               median ${sizeMs.toFixed(1)} ms, ${r.evaluated} candidates solved, ${r.feasible} within limits (first call ${firstMs.toFixed(0)} ms, tube layouts not yet cached)`);
  return figures;
}

if (process.argv[1]?.endsWith("thermal.ts")) run();
