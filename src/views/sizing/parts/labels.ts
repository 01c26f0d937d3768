/** Words for the engine's codes, shared by the form and the result parts of the sizing page. */
import { TUBE_MATERIALS } from '@shared/thermal/geometry/materials';
import { tubeSizeOf } from '@shared/thermal/geometry/tubes';
import { formatQuantity, type UnitSystem } from '@shared/thermal/units';

/** TEMA tube layout angles (domain brief 2.5). */
export const LAYOUT_LABELS: Record<number, string> = {
  30: '30° triangular',
  60: '60° rotated triangular',
  90: '90° square',
  45: '45° rotated square',
};

export const CORRELATION_LABELS: Record<string, string> = {
  auto: 'Automatic (by flow regime and Prandtl number)',
  gnielinski: 'Gnielinski (turbulent, Petukhov f)',
  'dittus-boelter': 'Dittus–Boelter (turbulent)',
  'sieder-tate': 'Sieder–Tate (viscosity correction)',
  hausen: 'Hausen (laminar thermal entry)',
  'laminar-fully-developed': 'Laminar, fully developed (Nu 3.66 / 4.36)',
};

export function materialName(id: string): string {
  return TUBE_MATERIALS.find((m) => m.id === id)?.name ?? id;
}

/** "3/4 in OD, BWG 20" (catalogue label when the OD is a catalogue size). */
export function tubeLabel(od_m: number, wallLabel: string, system: UnitSystem): string {
  const size = tubeSizeOf(od_m)?.label ?? formatQuantity(od_m, 'length', system, { digits: 3 });
  return `${size} OD, ${wallLabel}`;
}

export function layoutLabel(layout: number | undefined): string {
  return layout === undefined ? '—' : (LAYOUT_LABELS[layout] ?? `${layout}°`);
}

/** A tube or bundle length: metres or feet (the SI/US default for lengths is mm/in, right for diameters). */
export function lengthLabel(value_m: number, system: UnitSystem, digits = 3): string {
  return formatQuantity(value_m, 'length', { unit: system === 'US' ? 'ft' : 'm' }, { digits });
}
