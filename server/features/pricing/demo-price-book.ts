/**
 * The demo price book of "Alder Creek Thermal Works" (an invented fabricator). EVERY number here is
 * invented for the demo: no vendor's list, no market data. Money in US cents.
 */
import { priceBookSchema, type PriceBook } from '../../../shared/schemas/price-book';
import { PIPE_SHELLS, TUBE_MATERIALS, TUBE_SIZES } from '../../../shared/thermal/geometry';

/** Invented tube stock price per kg, cents, and a drawing/finishing premium per metre, cents. */
const TUBE_STOCK: Readonly<Record<string, { perKg: number; premiumPerMetre: number }>> = {
  copper: { perKg: 1400, premiumPerMetre: 60 },
  'admiralty-brass': { perKg: 1300, premiumPerMetre: 60 },
  'cuni-90-10': { perKg: 1900, premiumPerMetre: 60 },
  'cuni-70-30': { perKg: 2400, premiumPerMetre: 60 },
  'carbon-steel': { perKg: 250, premiumPerMetre: 40 },
  'stainless-304': { perKg: 650, premiumPerMetre: 80 },
  'stainless-316': { perKg: 850, premiumPerMetre: 80 },
  'titanium-gr2': { perKg: 4200, premiumPerMetre: 150 },
};

/** kg per metre of a tube: π/4 (OD² − ID²) ρ. */
export function tubeMassPerMetre(od_m: number, wall_m: number, density: number): number {
  const id = od_m - 2 * wall_m;
  return (Math.PI / 4) * (od_m * od_m - id * id) * density;
}

/** One row per material × OD × wall: round(kg/m × stock per kg + premium), rounded half up to a cent. */
function tubeRows(): PriceBook['tubes'] {
  const rows: PriceBook['tubes'] = [];
  for (const m of TUBE_MATERIALS) {
    const stock = TUBE_STOCK[m.id];
    if (!stock) throw new Error(`demo price book: no invented stock price for ${m.id}`);
    for (const size of TUBE_SIZES) {
      for (const w of size.walls) {
        const perMetre = tubeMassPerMetre(size.outerDiameter_m, w.wall_m, m.density) * stock.perKg + stock.premiumPerMetre;
        rows.push({ material: m.id, od: size.label, wall: w.label, perMetre_minor: Math.round(perMetre) });
      }
    }
  }
  return rows;
}

/** Invented shell pipe prices per metre, cents, by NPS. */
const PIPE_PER_METRE: Readonly<Record<number, number>> = {
  4: 4500, 5: 5800, 6: 7200, 8: 10500, 10: 14500, 12: 18500, 14: 21000, 16: 24500, 18: 28000, 20: 31500, 22: 35000, 24: 39000,
};

function shellPipeRows(): PriceBook['shellPipe'] {
  return PIPE_SHELLS.map((s) => {
    const nps = Number(/^NPS (\d+)/.exec(s.label)?.[1]);
    const perMetre = PIPE_PER_METRE[nps];
    if (perMetre === undefined) throw new Error(`demo price book: no invented pipe price for ${s.label}`);
    return { label: s.label, perMetre_minor: perMetre };
  });
}

/** Invented flanged nozzle prices, cents: [max NPS, class 150, class 300]. */
const NOZZLES: readonly [number, number, number][] = [
  [1, 9500, 13800], [1.5, 11500, 16700], [2, 14000, 20300], [3, 19500, 28300], [4, 26000, 37700],
  [6, 41000, 59500], [8, 62000, 89900], [10, 88000, 127600], [12, 118000, 171100],
];

export const demoPriceBook: PriceBook = priceBookSchema.parse({
  currency: 'USD',
  tubes: tubeRows(),
  tubeCutAllowance_m: 0.05,
  plate: [
    { material: 'carbon-steel', perKg_minor: 180 },
    { material: 'stainless-304', perKg_minor: 520 },
    { material: 'stainless-316', perKg_minor: 690 },
    { material: 'titanium-gr2', perKg_minor: 3800 },
  ],
  shellPipe: shellPipeRows(),
  // a pair of bonnets by the largest shell ID they fit (ladder follows the NPS shells, then rolled)
  heads: [
    [0.16, 62000], [0.21, 78000], [0.26, 98000], [0.31, 125000], [0.4, 165000], [0.5, 215000],
    [0.6, 275000], [0.8, 380000], [1.0, 520000], [1.25, 700000], [1.5, 920000],
  ].map(([d, p]) => ({ maxShellDiameter_m: d!, perPair_minor: p! })),
  nozzles: NOZZLES.flatMap(([nps, c150, c300]) => [
    { maxNps: nps, rating: '150' as const, each_minor: c150 },
    { maxNps: nps, rating: '300' as const, each_minor: c300 },
  ]),
  // impingement plate and U-bend (issue 11): invented like every figure here
  sundries: { tieRodPerMetre_minor: 450, gasketSet_minor: 8500, boltingSet_minor: 12000, paintPerM2_minor: 1800, impingementPlate_minor: 24000, uBendPerTube_minor: 650 },
  labourHours: { perTubeEnd: 0.08, perBaffle: 0.5, perNozzle: 1.5, fitUp: 6, hydrotest: 3, paint: 2 },
  shopRatePerHour_minor: 9500,
  overhead_pct: 18,
  margin_pct: 22,
  quantityBreaks: [
    { minQuantity: 3, discount_pct: 3 },
    { minQuantity: 5, discount_pct: 5 },
    { minQuantity: 10, discount_pct: 8 },
  ],
  expedite_pct: 15,
  standardLeadTimeWeeks: 8,
  deposit_pct: 30,
  cancellationFee_pct: 10,
  offerValidityDays: 30,
});
