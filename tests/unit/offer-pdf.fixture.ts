/**
 * An invented offer for the PDF test: Pellmar Compression's aftercooler (demo customer, domain
 * brief 6), sized by the real engine, with a hand-made price. Every name, address, price and duty
 * here is invented.
 */
import type { Price, PriceLine } from '../../shared/schemas/price-book';
import type { Revision } from '../../shared/schemas/quotes';
import { sizeRequestSchema, type SizeRequestInput } from '../../shared/schemas/thermal';
import { size } from '../../shared/thermal/size';
import type { OfferPdfInput } from '../../server/features/quotes/offer-pdf';

/** Compressed-air aftercooler: 0.35 kg/s of air at 8 bar(g) from 150 °C to 38 °C, water at 28 °C. */
export const aftercoolerDuty: SizeRequestInput = {
  process: {
    fluid: 'air-moist',
    pressure_Pa: 8e5 + 101325,
    massFlow_kg_s: 0.35,
    inletTemp_C: 150,
    outletTemp_C: 38,
    intake: { temp_C: 30, relativeHumidity: 0.6, pressure_Pa: 1e5 },
  },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 3e5 + 101325, massFlow_kg_s: 2.5, inletTemp_C: 28 },
  constraints: { maxTubeLength_m: 3, maxPressureDrop_Pa: 30000 },
};

const line = (key: string, group: PriceLine['group'], description: string, quantity: number, unit: string, rate_minor: number, amount_minor = Math.round(quantity * rate_minor)): PriceLine => ({
  key, group, description, quantity, unit, rate_minor, amount_minor, source: 'demo price book v1',
});

/**
 * Per-unit lines add up to 615 770 cents ($6,157.70); 2 units = 1 231 540; a 3 % quantity discount
 * of −36 946 gives a total of 1 194 594 cents = $11,945.94 (sums by hand).
 */
export const handMadePrice: Price = {
  currency: 'USD',
  lines: [
    line('tubes', 'material', 'Tubes, carbon steel 3/4 in BWG 20', 66, 'm', 1250), // 82 500
    line('tubesheets', 'material', 'Tubesheets and baffles, plate', 38, 'kg', 420), // 15 960
    line('shell', 'material', 'Shell pipe NPS 10 STD', 1.5, 'm', 14500), // 21 750
    line('heads', 'material', 'Channel heads (bonnets)', 1, 'pair', 62000), // 62 000
    line('nozzles', 'material', 'Nozzles with flanges, class 150', 4, 'each', 18500), // 74 000
    line('tube-ends', 'labour', 'Expanding tube ends', 6, 'h', 9500), // 57 000
    line('assembly', 'labour', 'Fit-up, hydrotest and paint', 14, 'h', 9500), // 133 000
    line('overhead', 'overhead', 'Overhead 15 %', 1, 'lot', 66932), // 15 % of 446 210, rounded
    line('margin', 'margin', 'Margin 20 %', 1, 'lot', 102628), // 20 % of 513 142, rounded
    line('qty-break', 'discount', 'Quantity discount, 2 units or more (3 %)', 1, 'lot', -36946),
  ],
  unit_minor: 615770,
  quantity: 2,
  total_minor: 1194594,
  priceBookVersion: 1,
};

export function offerInput(overrides: Partial<OfferPdfInput> = {}): OfferPdfInput {
  const sized = size(aftercoolerDuty);
  const revision: Revision = {
    number: 3,
    kind: 'offer',
    createdAt: '2026-03-12T09:30:00Z',
    createdBy: 'Dana Whitlock',
    duty: sizeRequestSchema.parse(aftercoolerDuty),
    design: sized.recommended,
    alternatives: sized.candidates.slice(1, 4).map(({ rating: _rating, ...d }) => d),
    price: handMadePrice,
    leadTimeWeeks: 8,
    validUntil: '2026-04-11',
  };
  return {
    fabricator: {
      name: 'Alder Creek Thermal Works',
      address: ['1450 Millrace Road', 'Alder Creek, OR 97000', 'United States'],
      email: 'offers@aldercreek-thermal.example',
      phone: '+1 555 0142 300',
    },
    customer: { organizationName: 'Pellmar Compression', contactName: 'Jonas Pellmar', contactEmail: 'jonas.pellmar@pellmar.example' },
    quote: { number: 'Q-2026-0042', reference: 'PC-75 screw package, aftercooler', quantity: 2, needBy: '2026-06-01' },
    revision,
    issuedAt: '2026-03-12T10:00:00Z',
    units: 'SI',
    depositPct: 30,
    showLines: 'summary',
    terms: [
      'Payment: 30 % deposit on acceptance, balance net 30 days from the date of shipment.',
      'Delivery: FCA our works, packed for road transport. Installation and commissioning are not included.',
      'Warranty: 12 months from start-up or 18 months from shipment, whichever comes first.',
    ],
    ...overrides,
  };
}
