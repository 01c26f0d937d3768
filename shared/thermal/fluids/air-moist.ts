/**
 * Compressed air carrying water vapour: mixture properties for a given humidity ratio.
 *
 * Mixing rules (ideal-gas mixture of dry air and water vapour, W = kg vapour / kg dry air):
 * - density: ρ = ρ_da(T, p − p_w) · (1 + W), dry air at its partial pressure (real-gas, ./air);
 * - cp per kg of mixture: (cp_da + W cp_v)/(1 + W), cp_v = 1860 J/(kg·K) (ASHRAE 2017 ch. 1);
 * - viscosity: Wilke, "A Viscosity Equation for Gas Mixtures", J. Chem. Phys. 18 (1950) 517,
 *   doi:10.1063/1.1747673: μ = Σ xᵢμᵢ / Σⱼ xⱼΦᵢⱼ,
 *   Φᵢⱼ = [1 + (μᵢ/μⱼ)^½ (Mⱼ/Mᵢ)^¼]² / [8 (1 + Mᵢ/Mⱼ)]^½;
 * - conductivity: Wassiljewa's equation with the Mason & Saxena Φᵢⱼ (same form as Wilke's),
 *   Phys. Fluids 1 (1958) 361, doi:10.1063/1.1724352.
 * Vapour viscosity and conductivity are the IAPWS 2008/2011 dilute-gas terms (./water-transport):
 * the vapour's partial pressure is small. Vapour above saturation at (T, p) cannot exist as gas: the
 * excess is treated as condensed liquid (mist or drained water), which carries no gas property.
 *
 * The `air-moist` fluid's `properties(T, p)` has no humidity argument: it assumes intake air at
 * 35 °C and 70 % RH at 1.01325 bar (a hot, humid design day; common practice, not a standard), i.e.
 * W ≈ 0.0252, reduced to saturation where (T, p) holds less. Rating code that knows the intake
 * should call `moistAirProperties` with its own humidity ratio.
 */
import { airInfo, airIssue, dryAirProperties } from './air';
import { defineFluid, props } from './fluid-base';
import { CP_VAPOUR, MOLAR_MASS_RATIO, humidityRatioFromIntake, saturationHumidityRatio } from './psychro';
import type { FluidInfo, FluidProperties } from './types';
import { waterConductivityDilute, waterViscosityDilute } from './water-transport';
import { ThermalInputError } from '../errors';

const M_AIR = 28.9586; // g/mol, Lemmon et al. 2000
const M_WATER = 18.015268; // g/mol, IAPWS-95

/** Humidity ratio assumed by the `air-moist` fluid: intake 35 °C, 70 % RH, 101 325 Pa. */
export const DESIGN_HUMIDITY_RATIO = humidityRatioFromIntake({ temp_C: 35, relativeHumidity: 0.7, pressure_Pa: 101325 });

function phi(mu_i: number, mu_j: number, m_i: number, m_j: number): number {
  const a = 1 + Math.sqrt(mu_i / mu_j) * Math.sqrt(Math.sqrt(m_j / m_i));
  return (a * a) / Math.sqrt(8 * (1 + m_i / m_j));
}

/** Wilke / Wassiljewa–Mason–Saxena rule for two components a (air) and v (vapour). */
function mix(xa: number, xv: number, pa: number, pv: number, mua: number, muv: number): number {
  const phiAV = phi(mua, muv, M_AIR, M_WATER);
  const phiVA = phi(muv, mua, M_WATER, M_AIR);
  return (xa * pa) / (xa + xv * phiAV) + (xv * pv) / (xv + xa * phiVA);
}

/**
 * Properties of humid air at `temp_C` and absolute `pressure_Pa` carrying `humidityRatio` kg/kg
 * (vapour in excess of saturation counts as condensed). Throws ThermalInputError outside
 * the dry-air range or for a negative humidity ratio.
 */
export function moistAirProperties(temp_C: number, pressure_Pa: number, humidityRatio: number): FluidProperties {
  const issue = airIssue(moistInfo, temp_C, pressure_Pa);
  if (issue) throw new ThermalInputError(issue.code, issue.message);
  if (!(humidityRatio >= 0) || !Number.isFinite(humidityRatio)) {
    throw new ThermalInputError('humidity-input', `The humidity ratio must be ≥ 0 kg/kg (got ${humidityRatio}).`, 'humidityRatio');
  }
  const w = Math.min(humidityRatio, saturationHumidityRatio(Math.min(temp_C, 370), pressure_Pa));
  const xv = w / (MOLAR_MASS_RATIO + w);
  const xa = 1 - xv;
  const dry = dryAirProperties(temp_C, pressure_Pa * xa);
  if (w === 0) return dry;
  const T = temp_C + 273.15;
  const muv = waterViscosityDilute(T);
  const kv = waterConductivityDilute(T);
  return props(
    dry.density * (1 + w),
    (dry.specificHeat + w * CP_VAPOUR) / (1 + w),
    mix(xa, xv, dry.viscosity, muv, dry.viscosity, muv),
    mix(xa, xv, dry.conductivity, kv, dry.viscosity, muv),
  );
}

const moistInfo: FluidInfo = {
  id: 'air-moist',
  name: 'Compressed air, humid',
  phase: 'gas',
  minTemp_C: airInfo.minTemp_C,
  maxTemp_C: airInfo.maxTemp_C,
  source:
    'Dry air after Lemmon et al. 2000 / Lemmon & Jacobsen 2004; water vapour after IAPWS 2008/2011; ' +
    'humidity after ASHRAE Handbook—Fundamentals 2017 ch. 1 (psychrolib); mixing rules of Wilke 1950 and ' +
    'Mason & Saxena 1958; assumes intake at 35 °C, 70 % RH',
};

export const airMoist = defineFluid(
  moistInfo,
  (t, p) => airIssue(moistInfo, t, p),
  (t, p) => moistAirProperties(t, p, DESIGN_HUMIDITY_RATIO),
);
