/**
 * A rated design in words and the reader's units: the design summary and the predicted
 * performance, as label/value pairs. Shared by the offer and, later, the build sheet.
 */
import type { Design } from '../../../shared/schemas/thermal';
import { tubeMaterial } from '../../../shared/thermal/geometry/materials';
import { tubeSizeOf } from '../../../shared/thermal/geometry/tubes';
import type { UnitSystem } from '../../../shared/thermal/units';
import { formatNumber, showQuantity } from './quantities';

const LAYOUT_NAMES: Record<number, string> = { 30: '30° triangular', 60: '60° rotated triangular', 90: '90° square', 45: '45° rotated square' };

/** "3/4 in" from the tube catalogue, else the OD in the reader's units. */
export function tubeOdLabel(od_m: number, units: UnitSystem): string {
  return tubeSizeOf(od_m)?.label ?? showQuantity(od_m, 'length', units);
}

export function materialName(id: string): string {
  return tubeMaterial(id)?.name ?? id;
}

export function designPairs(d: Design, units: UnitSystem): [string, string][] {
  const len = (v: number) => showQuantity(v, 'length', units, { unit: units === 'SI' ? 'm' : 'ft' });
  const pairs: [string, string][] = [
    ['Tubes', `${d.tubeCount} × ${tubeOdLabel(d.tubeOuterDiameter_m, units)} OD, ${d.tubeWallLabel}`],
    ['Tube material', materialName(d.tubeMaterial)],
    ['Tube length', len(d.tubeLength_m)],
    ['Tube passes', String(d.tubePasses)],
  ];
  if (d.layout !== undefined) {
    const pitch = d.tubePitch_m !== undefined ? `, pitch ${showQuantity(d.tubePitch_m, 'length', units)}` : '';
    pairs.push(['Tube layout', `${LAYOUT_NAMES[d.layout]}${pitch}`]);
  }
  if (d.shellInnerDiameter_m !== undefined) {
    const label = d.shellLabel ? `${d.shellLabel}, ` : '';
    pairs.push(['Shell', `${label}${showQuantity(d.shellInnerDiameter_m, 'length', units)} ID`]);
  }
  if (d.baffleSpacing_m !== undefined) pairs.push(['Baffle spacing', showQuantity(d.baffleSpacing_m, 'length', units)]);
  pairs.push(['Heat-transfer area', showQuantity(d.area_m2, 'area', units)]);
  pairs.push(['Over-surface margin', `${formatNumber(d.overSurface_pct, 2)} %`]);
  return pairs;
}

/** One sentence on the tube-side method: the correlation that ran, the regime and Re. */
export function methodSentence(d: Design): string {
  const r = d.rating;
  return `Tube-side heat transfer: ${r.correlationName}; ${r.regime} flow, Reynolds number ${formatNumber(r.reynolds, 3)}.`;
}

export function performancePairs(d: Design, units: UnitSystem): [string, string][] {
  const r = d.rating;
  const t = (v: number) => showQuantity(v, 'temperature', units);
  const dp = (v: number) => showQuantity(v, 'pressureDrop', units);
  const duty = units === 'SI' ? showQuantity(r.duty_W, 'power', 'SI') : `${showQuantity(r.duty_W, 'power', 'US', { digits: 4 })} (${showQuantity(r.duty_W, 'power', 'SI')})`;
  const pairs: [string, string][] = [
    ['Process outlet temp.', t(r.outletTemp_C)],
    ['Heat duty', duty],
  ];
  if (r.coolantOutletTemp_C !== undefined) pairs.push(['Coolant outlet temp.', t(r.coolantOutletTemp_C)]);
  pairs.push(['Tube-side pressure drop', dp(r.pressureDrop.total_Pa)]);
  if (r.shellPressureDrop_Pa !== undefined) pairs.push(['Shell-side pressure drop', dp(r.shellPressureDrop_Pa)]);
  if (r.overallU_W_m2K !== undefined) pairs.push(['Overall U (outside)', showQuantity(r.overallU_W_m2K, 'heatTransferCoefficient', units)]);
  if (r.lmtdCorrectionF !== undefined) pairs.push(['LMTD correction F', formatNumber(r.lmtdCorrectionF, 3)]);
  pairs.push(['Tube-side velocity', showQuantity(r.velocity_m_s, 'velocity', units)]);
  if (r.condensate_kg_s !== undefined) {
    pairs.push(['Condensate (water)', showQuantity(r.condensate_kg_s, 'massFlow', units)]);
    if (r.latentDuty_W !== undefined) pairs.push(['Latent heat in the duty', showQuantity(r.latentDuty_W, 'power', units, { digits: units === 'US' ? 4 : 3 })]);
  }
  return pairs;
}
