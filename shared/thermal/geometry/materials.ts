/** Tube materials: conductivity for the wall resistance, density for mass, a relative cost weight. */

export interface TubeMaterial {
  id: string;
  name: string;
  /** W/(m·K) near 50 °C */
  conductivity: number;
  /** kg/m³ */
  density: number;
  /** true for copper alloys, which erode at high water velocity */
  copperAlloy: boolean;
}

/**
 * Conductivities: domain brief 2.3, handbook values near 50 °C (memory; confirm against e.g. the
 * ASM Metals Handbook or the supplier's data sheet). Densities: handbook values at 20 °C (memory).
 */
export const TUBE_MATERIALS: readonly TubeMaterial[] = [
  { id: 'copper', name: 'Copper (C12200)', conductivity: 340, density: 8940, copperAlloy: true },
  { id: 'admiralty-brass', name: 'Admiralty brass (C44300)', conductivity: 110, density: 8530, copperAlloy: true },
  { id: 'cuni-90-10', name: '90/10 copper-nickel (C70600)', conductivity: 45, density: 8940, copperAlloy: true },
  { id: 'cuni-70-30', name: '70/30 copper-nickel (C71500)', conductivity: 29, density: 8950, copperAlloy: true },
  { id: 'carbon-steel', name: 'Carbon steel', conductivity: 50, density: 7850, copperAlloy: false },
  { id: 'stainless-304', name: 'Stainless steel 304', conductivity: 16, density: 7900, copperAlloy: false },
  { id: 'stainless-316', name: 'Stainless steel 316', conductivity: 15, density: 8000, copperAlloy: false },
  { id: 'titanium-gr2', name: 'Titanium grade 2', conductivity: 21, density: 4510, copperAlloy: false },
];

export const tubeMaterialIds = TUBE_MATERIALS.map((m) => m.id) as [string, ...string[]];

export function tubeMaterial(id: string): TubeMaterial | undefined {
  return TUBE_MATERIALS.find((m) => m.id === id);
}
