/**
 * A cooler's duty (a thermal size request) in words and the reader's units: the rows of the duty
 * table (process side | cooling side) and the limits the design was sized to. Shared by the
 * offer and, later, the build sheet.
 */
import type { FluidRef, SizeRequest } from '../../../shared/schemas/thermal';
import { listFluids } from '../../../shared/thermal/fluids';
import { flowText } from '../../../shared/thermal/flow-units';
import type { UnitSystem } from '../../../shared/thermal/units';
import { showQuantity } from './quantities';

const DASH = '–';

/** The library's name of a fluid, or a description of customer-supplied constant properties. */
export function fluidName(fluid: FluidRef): string {
  if (typeof fluid !== 'string') return 'Customer-supplied fluid (constant properties)';
  return listFluids().find((f) => f.id === fluid)?.name ?? fluid;
}

/** Rows `[item, process side, cooling side]` of the duty table. */
export function dutyRows(duty: SizeRequest, units: UnitSystem): string[][] {
  const p = duty.process;
  const b = duty.boundary;
  const t = (v: number) => showQuantity(v, 'temperature', units);
  const gauge = (v: number) => showQuantity(v, 'pressure', units, { pressureBasis: 'gauge' });
  // the flow as the customer gave it (mass, volume at the inlet, or normal/standard volume; issue 12)
  const flow = (f: Parameters<typeof flowText>[0]) => (f.massFlow_kg_s !== undefined ? showQuantity(f.massFlow_kg_s, 'massFlow', units, { digits: 4 }) : flowText(f, units));
  const coolant = b.kind === 'coolant' ? b : undefined;
  const rows: string[][] = [
    ['Fluid', fluidName(p.fluid), coolant ? fluidName(coolant.fluid) : 'Constant wall temperature'],
    ['Flow', flow(p), coolant ? flow(coolant) : DASH],
    ['Inlet temperature', t(p.inletTemp_C), coolant ? t(coolant.inletTemp_C) : DASH],
    ['Target outlet temperature', t(p.outletTemp_C), DASH],
    ['Operating pressure', gauge(p.pressure_Pa), coolant ? gauge(coolant.pressure_Pa) : DASH],
  ];
  if (b.kind === 'wall') rows.push(['Wall temperature', DASH, t(b.wallTemp_C)]);
  if (p.intake) {
    const i = p.intake;
    const rh = Math.round(i.relativeHumidity * 100);
    const intake = `${t(i.temp_C)}, ${rh} % RH, ${showQuantity(i.pressure_Pa, 'pressure', units, { pressureBasis: 'absolute' })}`;
    rows.push(['Compressor intake air', intake, DASH]);
  }
  return rows;
}

/** Label/value pairs of the limits the design had to meet. */
export function limitPairs(duty: SizeRequest, units: UnitSystem): [string, string][] {
  const c = duty.constraints;
  const length = (v: number) => showQuantity(v, 'length', units, { unit: units === 'SI' ? 'm' : 'ft' });
  const pairs: [string, string][] = [
    ['Max. tube length', length(c.maxTubeLength_m)],
    ['Max. pressure drop, tubes', showQuantity(c.maxPressureDrop_Pa, 'pressureDrop', units)],
  ];
  if (c.maxShellPressureDrop_Pa !== undefined) pairs.push(['Max. pressure drop, shell', showQuantity(c.maxShellPressureDrop_Pa, 'pressureDrop', units)]);
  if (c.maxShellInnerDiameter_m !== undefined) pairs.push(['Max. shell ID', showQuantity(c.maxShellInnerDiameter_m, 'length', units)]);
  const fi = c.foulingInside_m2K_W ?? (duty.boundary.kind === 'coolant' ? duty.boundary.foulingInside_m2K_W : undefined);
  const fo = c.foulingOutside_m2K_W ?? (duty.boundary.kind === 'coolant' ? duty.boundary.foulingOutside_m2K_W : undefined);
  if (fi !== undefined) pairs.push(['Fouling, tube side', showQuantity(fi, 'fouling', units, { digits: 2 })]);
  if (fo !== undefined) pairs.push(['Fouling, shell side', showQuantity(fo, 'fouling', units, { digits: 2 })]);
  return pairs;
}
