/**
 * The offer's margin and uncertainty policy and its operating cases (issue 11): the guaranteed
 * process outlet with the prediction, its band and the design margin that backs it; the fouling
 * resistances used and where they came from; one row per operating case.
 */
import type { Design, SizeRequest } from '../../../shared/schemas/thermal';
import type { UnitSystem } from '../../../shared/thermal/units';
import type { TableOptions } from './table';
import { showQuantity } from './quantities';

/** A temperature difference (a band), K or °F. */
export function showDelta(k: number, units: UnitSystem): string {
  return units === 'SI' ? `${k.toFixed(1)} K` : `${(k * 1.8).toFixed(1)} °F`;
}

/**
 * "Guaranteed process outlet at most 45.0 °C; predicted 43.8 ± 1.1 °C; 10 % area margin." The guarantee is
 * the duty's target outlet; the prediction is the rating; the band the rating's `outletUncertainty_K`.
 */
export function guaranteeSentence(d: Design, duty: SizeRequest, units: UnitSystem): string {
  const t = (v: number) => showQuantity(v, 'temperature', units);
  const r = d.rating;
  const band = r.outletUncertainty_K !== undefined ? ` ± ${showDelta(r.outletUncertainty_K, units).replace(/ (K|°F)$/, '')} ${units === 'SI' ? '°C' : '°F'}` : '';
  const predicted = `${t(r.outletTemp_C).replace(/ ?°[CF]$/, '')}${band || ` ${units === 'SI' ? '°C' : '°F'}`}`;
  const margin = d.designMargin_pct !== undefined ? `${Math.round(d.designMargin_pct * 10) / 10} % area margin` : `${Math.max(0, Math.round(d.overSurface_pct))} % over-surface`;
  const parts = [`Guaranteed process outlet at most ${t(duty.process.outletTemp_C)}`, `predicted ${predicted}`, margin];
  const why =
    (r.outletUncertainty_K !== undefined ? ' The band follows from the stated accuracy of the film correlations used (tube side and shell side), the overall coefficient taken at its low and high ends.' : '') +
    (d.designMargin_pct !== undefined ? ' The margin is added to the area the duty needs before the tube length is rounded up.' : '');
  return `${parts.join('; ')}.${why}`;
}

/** Which fouling resistances were used and where they come from. */
export function foulingSentence(d: Design, duty: SizeRequest): string | undefined {
  const r = d.rating;
  if (r.foulingTube_m2K_W === undefined && r.foulingShell_m2K_W === undefined) return undefined;
  const b = duty.boundary;
  const given =
    (duty.constraints.foulingInside_m2K_W ?? duty.constraints.foulingOutside_m2K_W) !== undefined ||
    (b.kind === 'coolant' && (b.foulingInside_m2K_W ?? b.foulingOutside_m2K_W) !== undefined);
  const v = (x: number | undefined) => (x === undefined ? '—' : `${x.toFixed(5)} m²K/W`);
  return (
    `Fouling allowance: tube side ${v(r.foulingTube_m2K_W)}, shell side ${v(r.foulingShell_m2K_W)} ` +
    (given ? '(as stated in the request).' : "(each fluid's default fouling resistance, typical tabulated values for the service).")
  );
}

/** One row per operating case: name, coolant inlet, outlet (band) against target, tube and shell pressure drop. */
export function casesTable(d: Design, units: UnitSystem): TableOptions | undefined {
  if (!d.cases?.length) return undefined;
  const t = (v: number) => showQuantity(v, 'temperature', units);
  const dp = (v: number) => showQuantity(v, 'pressureDrop', units);
  return {
    fontSize: 9,
    zebra: true,
    columns: [
      { header: 'Operating case', weight: 22 },
      { header: 'Coolant inlet', weight: 14 },
      { header: 'Process outlet', weight: 20 },
      { header: 'Target', weight: 12 },
      { header: 'Tube-side pressure drop', weight: 16 },
      { header: 'Shell-side pressure drop', weight: 16 },
    ],
    rows: d.cases.map((c) => [
      `${c.name}${d.governingCase === c.name ? ' (governing)' : ''}`,
      c.coolantInletTemp_C !== undefined ? t(c.coolantInletTemp_C) : '—',
      `${t(c.outletTemp_C)}${c.outletUncertainty_K !== undefined ? ` ± ${showDelta(c.outletUncertainty_K, units)}` : ''}${c.meets === false ? ' (not met)' : ''}`,
      c.targetOutletTemp_C !== undefined ? t(c.targetOutletTemp_C) : '—',
      dp(c.pressureDrop_Pa),
      c.shellPressureDrop_Pa !== undefined ? dp(c.shellPressureDrop_Pa) : '—',
    ]),
  };
}
