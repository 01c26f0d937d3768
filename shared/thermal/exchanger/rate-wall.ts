/** Rating against a wall held at a constant temperature (exponential decay along the tube). */
import type { RateResult } from '../../schemas/thermal';
import type { CorrelationChoice } from '../correlations/select';
import type { FluidProperties } from '../fluids';
import { ENGINEERING_CAUTION, tubeWarnings } from './checks';
import { solveFixedPoint } from './solve';
import { condensation, propertiesOrNull, type Stream } from './streams';
import { entranceLength, tubePressureDrop, tubeSideConvection, tubeSideH, tubeVelocity, type Bundle } from './tube-side';
import { outletBandWall, tubeAccuracy } from './uncertainty';
import { ntuWall, outletTempWall } from './wall';

export interface RateOptions {
  /** points of the temperature profile along the tube path (0: none); default 21 */
  profilePoints?: number;
}

/** Specific heat that also carries the latent heat of condensing water (humid air), J/(kg·K). */
export function effectiveCp(s: Stream, bulk: FluidProperties, outletTemp_C: number): { cp: number; condensate_kg_s: number; latent_W: number } {
  if (s.humidityRatio === undefined) return { cp: bulk.specificHeat, condensate_kg_s: 0, latent_W: 0 };
  const c = condensation(s, outletTemp_C);
  const dt = s.inletTemp_C - outletTemp_C;
  return { cp: bulk.specificHeat + (dt > 1e-9 ? c.latent_W / (s.massFlow_kg_s * dt) : 0), ...c };
}

/** Iterates the outlet temperature until the properties at the mean bulk temperature agree. */
export function rateWall(s: Stream, wallTemp_C: number, b: Bundle, choice: CorrelationChoice, opts: RateOptions = {}): RateResult {
  const tIn = s.inletTemp_C;
  const wall = propertiesOrNull(s, wallTemp_C);
  const path = b.passes * b.length;
  const mTube = (s.massFlow_kg_s * b.passes) / b.count;
  const props = s.properties;
  const span = tIn - wallTemp_C;
  // the map written in the call, not bound to a name: a named closure costs a name property per rating under tsx
  const x = solveFixedPoint(
    (tOut) => {
      const tMean = 0.5 * (tIn + tOut);
      const bulk = props(tMean);
      const h = tubeSideH(b, s.massFlow_kg_s, bulk, wall ?? bulk, tMean, wallTemp_C, s.fluid.phase, choice);
      return outletTempWall(tIn, wallTemp_C, ntuWall(b.dInner, path, h, mTube, effectiveCp(s, bulk, tOut).cp));
    },
    wallTemp_C + 0.3 * span, wallTemp_C, tIn, 1e-7 * (1 + span),
  );
  const tMean = 0.5 * (tIn + x);
  const bulk = props(tMean);
  const conv = tubeSideConvection(b, s.massFlow_kg_s, bulk, wall ?? bulk, tMean, wallTemp_C, s.fluid.phase, choice, true);
  const eff = effectiveCp(s, bulk, x);
  const ntu = ntuWall(b.dInner, path, conv.h, mTube, eff.cp);
  const tOut = outletTempWall(tIn, wallTemp_C, ntu);
  const dp = tubePressureDrop(b, s.massFlow_kg_s, bulk);
  const velocity = tubeVelocity(b, s.massFlow_kg_s, bulk.density);
  const warnings = [...conv.warnings, ...tubeWarnings(s, b, velocity, dp.total_Pa)];
  if (!wall) warnings.push({ code: 'wall-properties', message: `The fluid has no data at the wall temperature ${wallTemp_C} °C; wall corrections use bulk properties.` });
  const n = opts.profilePoints ?? 21;
  const profile = [];
  for (let i = 0; i < n; i++) {
    const x = (path * i) / (n - 1);
    profile.push({ x_m: x, process_C: outletTempWall(tIn, wallTemp_C, (ntu * x) / path) });
  }
  const result: RateResult = {
    outletTemp_C: tOut,
    duty_W: s.massFlow_kg_s * eff.cp * (tIn - tOut),
    regime: conv.regime,
    correlation: conv.method,
    correlationName: conv.methodName,
    corrections: conv.corrections,
    reynolds: conv.re,
    prandtl: conv.pr,
    nusselt: conv.nusselt,
    htc_W_m2K: conv.h,
    velocity_m_s: velocity,
    entranceLength_m: entranceLength(conv.re, conv.pr, b.dInner),
    frictionFactor: dp.frictionFactor,
    pressureDrop: { friction_Pa: dp.friction_Pa, returns_Pa: dp.returns_Pa, nozzles_Pa: dp.nozzles_Pa, total_Pa: dp.total_Pa },
    bulkMeanTemp_C: tMean,
    area_m2: b.count * Math.PI * b.dInner * b.length,
    ntu,
    warnings,
    caution: ENGINEERING_CAUTION,
    profile,
  };
  result.outletUncertainty_K = outletBandWall(tIn, wallTemp_C, ntu, tubeAccuracy(conv.method));
  if (s.humidityRatio !== undefined) {
    result.condensate_kg_s = eff.condensate_kg_s;
    result.latentDuty_W = eff.latent_W;
  }
  return result;
}
