/**
 * A rated design in words and the reader's units: the design summary (which fluid goes where and
 * why, shells in series, baffles) and the predicted performance, as label/value pairs, and the
 * technical lines on the methods (tube side; shell side by Bell–Delaware with Kern's h as a second
 * opinion and the correction factors). Old stored designs read as one shell, process in the tubes.
 */
import type { Design, SizeRequest } from '../../../shared/schemas/thermal';
import { wallSides } from '../../../shared/thermal/checks/walls';
import { tubeMaterial } from '../../../shared/thermal/geometry/materials';
import { tubeSizeOf } from '../../../shared/thermal/geometry/tubes';
import type { UnitSystem } from '../../../shared/thermal/units';
import { baffleCutOf, bafflesPerShell, processSideOf, shellsOf } from '../../features/pricing/design-fields';
import { fluidName } from './duty-rows';
import { formatNumber, showQuantity } from './quantities';

const LAYOUT_NAMES: Record<number, string> = { 30: '30° triangular', 60: '60° rotated triangular', 90: '90° square', 45: '45° rotated square' };

/** "3/4 in" from the tube catalogue, else the OD in the reader's units. */
export function tubeOdLabel(od_m: number, units: UnitSystem): string {
  return tubeSizeOf(od_m)?.label ?? showQuantity(od_m, 'length', units);
}

export function materialName(id: string): string {
  return tubeMaterial(id)?.name ?? id;
}

/**
 * Where each fluid is, in words: "Water (coolant) in the tubes; Mineral oil ISO VG 46 (process) on
 * the shell side". Without the duty, the streams by role only.
 */
export function allocationWords(d: Design, duty?: SizeRequest): string {
  const b = duty?.boundary;
  const process = duty ? `${fluidName(duty.process.fluid)} (process)` : 'Process';
  const coolant = b ? (b.kind === 'coolant' ? `${fluidName(b.fluid)} (coolant)` : 'bath at constant wall temperature') : 'coolant';
  const lower = (t: string) => (duty ? t : t.toLowerCase());
  return processSideOf(d) === 'shell' && b?.kind !== 'wall'
    ? `${duty ? coolant : 'Coolant'} in the tubes; ${lower(process)} on the shell side`
    : `${process} in the tubes; ${coolant} on the shell side`;
}

export function designPairs(d: Design, units: UnitSystem, duty?: SizeRequest): [string, string][] {
  const len = (v: number) => showQuantity(v, 'length', units, { unit: units === 'SI' ? 'm' : 'ft' });
  const n = shellsOf(d);
  const each = n > 1 ? ' per shell' : '';
  const pairs: [string, string][] = [
    ['Fluid allocation', allocationWords(d, duty)],
  ];
  pairs.push(
    ['Shells in series', n === 1 ? '1 shell' : `${n} identical shells in series`],
    ['Tubes', `${d.tubeCount} × ${tubeOdLabel(d.tubeOuterDiameter_m, units)} OD, ${d.tubeWallLabel}${each}`],
    ['Tube material', materialName(d.tubeMaterial)],
    ['Tube length', `${len(d.tubeLength_m)}${each}`],
    ['Tube passes', String(d.tubePasses)],
  );
  if (d.layout !== undefined) {
    const pitch = d.tubePitch_m !== undefined ? `, pitch ${showQuantity(d.tubePitch_m, 'length', units)}` : '';
    pairs.push(['Tube layout', `${LAYOUT_NAMES[d.layout]}${pitch}`]);
  }
  if (d.shellInnerDiameter_m !== undefined) {
    const label = d.shellLabel ? `${d.shellLabel}, ` : '';
    pairs.push(['Shell', `${label}${showQuantity(d.shellInnerDiameter_m, 'length', units)} ID`]);
  }
  pairs.push(...constructionPairs(d, units));
  if (d.baffleSpacing_m !== undefined) {
    const q = (v: number) => showQuantity(v, 'length', units);
    const ends = d.inletBaffleSpacing_m !== undefined || d.outletBaffleSpacing_m !== undefined
      ? ` (inlet ${q(d.inletBaffleSpacing_m ?? d.baffleSpacing_m)}, outlet ${q(d.outletBaffleSpacing_m ?? d.baffleSpacing_m)})`
      : '';
    pairs.push(['Baffle spacing', `${q(d.baffleSpacing_m)}${ends}`]);
    const cut = baffleCutOf(d);
    const cutLength = d.shellInnerDiameter_m !== undefined ? ` (${showQuantity(cut * d.shellInnerDiameter_m, 'length', units)})` : '';
    pairs.push(['Baffles', `${bafflesPerShell(d)} segmental${each}, cut ${formatNumber(cut * 100, 3)} % of the shell ID${cutLength}`]);
  }
  pairs.push(...wallPairs(d, units, duty));
  const area = showQuantity(d.area_m2, 'area', units);
  pairs.push(['Heat-transfer area', n > 1 ? `${area} in all (${showQuantity(d.area_m2 / n, 'area', units)} per shell)` : area]);
  pairs.push(['Over-surface margin', `${formatNumber(d.overSurface_pct, 2)} %`]);
  return pairs;
}

/**
 * Issue 11, walls for pressure: each side's design pressure and temperature (the duty's, else the
 * default from the operating values, shared/thermal/checks/walls.ts) and the walls they need
 * (ASME VIII-1 UG-27 with corrosion allowance; the tube at least the material's minimum gauge)
 * beside the walls the design has. Designs stored before it carry no required walls: no wall row.
 */
export function wallPairs(d: Design, units: UnitSystem, duty?: SizeRequest): [string, string][] {
  const out: [string, string][] = [];
  const q = (v: number) => showQuantity(v, 'length', units);
  if (duty) {
    const sides = wallSides(duty, processSideOf(d));
    const point = (s: typeof sides.tube) =>
      `${showQuantity(s.design.pressure_Pa, 'pressure', units, { pressureBasis: 'gauge' })} at ${showQuantity(s.design.temp_C, 'temperature', units)}${s.design.stated ? '' : ' (default: operating + margin)'}`;
    out.push(['Design pressure and temp.', `tube side ${point(sides.tube)}; shell side ${point(sides.shell)}`]);
  }
  if (d.tubeWallRequired_m !== undefined) {
    const shell = d.shellWallRequired_m !== undefined && d.shellWall_m !== undefined ? `; shell ${q(d.shellWallRequired_m)} (wall ${q(d.shellWall_m)})` : '';
    out.push(['Walls needed (UG-27)', `tube ${q(d.tubeWallRequired_m)} (wall ${q(d.tubeWall_m)})${shell}`]);
  }
  return out;
}

export const CONSTRUCTION_NAMES: Record<string, string> = {
  BEM: 'fixed tubesheets', BEU: 'U-tube bundle', AES: 'split-ring floating head', AET: 'pull-through floating head',
};
export const TEMA_CLASS_NAMES: Record<string, string> = { R: 'severe process service', C: 'general commercial service', B: 'chemical process service' };

/**
 * Issue 11: the TEMA construction and class, and each side's nozzles (size, velocity and ρv² at
 * inlet and outlet, an impingement plate at the shell inlet). Designs stored before it: no rows.
 */
export function constructionPairs(d: Design, units: UnitSystem): [string, string][] {
  const out: [string, string][] = [];
  if (d.construction) {
    const cls = d.temaClass ?? 'C';
    out.push(['Construction (TEMA)', `${d.construction} (${CONSTRUCTION_NAMES[d.construction] ?? d.construction}), class ${cls} (${TEMA_CLASS_NAMES[cls] ?? cls})`]);
  }
  for (const side of ['tube', 'shell'] as const) {
    const ns = (d.nozzles ?? []).filter((z) => z.side === side);
    if (!ns.length) continue;
    const at = ns.map((z) => `${z.role} ${z.label} ${showQuantity(z.velocity_m_s, 'velocity', units)}, ρv² ${formatNumber(z.rhoV2, 3)} kg/(m·s²)${z.impingementPlate ? ', impingement plate' : ''}`);
    out.push([side === 'tube' ? 'Tube-side nozzles' : 'Shell-side nozzles', at.join('; ')]);
  }
  return out;
}

/** The design's reasons in words, each a sentence or two: why this allocation, why this design won. */
export function designReasons(d: Design): string[] {
  const out: string[] = [];
  if (d.allocationReason) out.push(`Why this allocation: ${d.allocationReason}`);
  if (d.recommendedReason) out.push(`Why this design: ${d.recommendedReason}`);
  if (d.constructionReason) out.push(`Why this construction: ${d.constructionReason}`);
  return out;
}

/** One sentence on the tube-side method: the correlation that ran, the regime and Re. */
export function methodSentence(d: Design): string {
  const r = d.rating;
  return `Tube-side heat transfer: ${r.correlationName}; ${r.regime} flow, Reynolds number ${formatNumber(r.reynolds, 3)}.`;
}

/**
 * The shell-side method in one technical line: the method whose h and ΔP were used, Kern's h as the
 * second opinion, and Bell–Delaware's correction factors (J_c baffle cut, J_l leakage, J_b bypass,
 * J_s end spacing, J_r laminar) when it ran. A design rated before Bell–Delaware was rated by Kern's
 * method. Nothing for a design without a shell-side stream (a bath).
 */
export function shellMethodSentence(d: Design, units: UnitSystem): string | undefined {
  const r = d.rating;
  if (r.shellHtc_W_m2K === undefined) return undefined;
  const h = (v: number) => showQuantity(v, 'heatTransferCoefficient', units);
  const re = r.shellReynolds !== undefined ? `, Reynolds number ${formatNumber(r.shellReynolds, 3)}` : '';
  if (r.shellMethod !== 'bell-delaware') {
    return `Shell-side heat transfer: Kern's method (1950), h = ${h(r.shellHtc_W_m2K)}${re}.`;
  }
  const kern = r.shellHtcKern_W_m2K !== undefined ? `; Kern's method (1950), as a second opinion, gives h = ${h(r.shellHtcKern_W_m2K)}` : '';
  const c = r.shellCorrections;
  const js = c
    ? ` Correction factors: J_c ${formatNumber(c.Jc, 3)} (baffle cut), J_l ${formatNumber(c.Jl, 3)} (leakage), J_b ${formatNumber(c.Jb, 3)} (bypass), J_s ${formatNumber(c.Js, 3)} (end spacing), J_r ${formatNumber(c.Jr, 3)} (laminar); product ${formatNumber(c.Jc * c.Jl * c.Jb * c.Js * c.Jr, 3)}.`
    : '';
  return `Shell-side heat transfer: Bell–Delaware method (Taborek, Heat Exchanger Design Handbook §3.3), h = ${h(r.shellHtc_W_m2K)}${re}${kern}.${js}`;
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
