/** Velocity and pressure-drop checks against the domain brief's windows (section 2.4, common practice). */
import type { ThermalWarning } from '../errors';
import type { Stream } from './streams';
import type { Bundle } from './tube-side';

/** Water in tubes ~0.9–2.5 m/s; copper alloys erode above ~1.8 m/s (domain brief 2.4, common practice). */
export const TUBE_WATER_VELOCITY_MIN = 0.9;
export const TUBE_WATER_VELOCITY_MAX = 2.5;
export const TUBE_COPPER_VELOCITY_MAX = 1.8;
/** Gases: pressure drop a few percent of the absolute pressure (common practice); 5 % warned. */
export const GAS_DP_FRACTION = 0.05;

export function tubeWarnings(s: Stream, b: Bundle, velocity: number, totalDp: number): ThermalWarning[] {
  const out: ThermalWarning[] = [];
  if (s.aqueous) {
    if (velocity < TUBE_WATER_VELOCITY_MIN) out.push({ code: 'tube-velocity-low', message: `Tube-side velocity ${velocity.toFixed(2)} m/s is below about ${TUBE_WATER_VELOCITY_MIN} m/s: water-based liquids foul at low velocity (common practice). Fewer tubes per pass or more passes raise it.` });
    if (velocity > TUBE_WATER_VELOCITY_MAX) out.push({ code: 'tube-velocity-high', message: `Tube-side velocity ${velocity.toFixed(2)} m/s is above about ${TUBE_WATER_VELOCITY_MAX} m/s (common practice): erosion risk.` });
    else if (b.copperAlloy && velocity > TUBE_COPPER_VELOCITY_MAX) out.push({ code: 'tube-velocity-erosion', message: `Tube-side velocity ${velocity.toFixed(2)} m/s is above about ${TUBE_COPPER_VELOCITY_MAX} m/s, where copper alloys erode (common practice).` });
  }
  if (s.fluid.phase === 'gas' && totalDp > GAS_DP_FRACTION * s.pressure_Pa) {
    out.push({ code: 'gas-pressure-drop', message: `Tube-side pressure drop is ${((100 * totalDp) / s.pressure_Pa).toFixed(1)} % of the absolute pressure: above a few percent (common practice) the gas density changes along the tube and this estimate, at mean density, is less reliable.` });
  }
  return out;
}

/** The caution every result carries (domain brief section 4). */
export const ENGINEERING_CAUTION =
  'Engineering estimate for quotation. The final design is checked by the fabricator’s responsible engineer under the pressure-vessel code in force where the unit is installed (ASME Section VIII, PED or local rules) and the customer’s site rules.';
