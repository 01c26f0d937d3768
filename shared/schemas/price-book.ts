/**
 * The fabricator's price book: what material, labour and margins cost. Versioned (every save is a
 * new version; revisions keep the version they were priced with). Money is in integer minor units
 * (cents) of `currency`. Admins edit it; the pricing service and the sizing search read it.
 */
import { z } from 'zod';

const minor = z.int().nonnegative();
const pct = z.number().min(0).max(100);

export const currencies = ['USD', 'EUR', 'GBP', 'CAD'] as const;

export const priceBookSchema = z.object({
  currency: z.enum(currencies),
  /** tube stock per metre, by material id, OD label (`3/4 in`, `20 mm`) and wall label (`BWG 16`, `1.5 mm`) */
  tubes: z.array(z.object({ material: z.string().min(1), od: z.string().min(1), wall: z.string().min(1), perMetre_minor: minor })).min(1),
  /** length added to every tube for cutting and expanding, m */
  tubeCutAllowance_m: z.number().min(0).max(0.3),
  /** plate per kg by material id (`carbon-steel`, …): tubesheets, baffles, rolled shells */
  plate: z.array(z.object({ material: z.string().min(1), perKg_minor: minor })).min(1),
  /** shell pipe per metre by label (`NPS 12 STD`) */
  shellPipe: z.array(z.object({ label: z.string().min(1), perMetre_minor: minor })),
  /** a pair of channel heads (bonnets) by the largest shell inner diameter they fit, m */
  heads: z.array(z.object({ maxShellDiameter_m: z.number().positive(), perPair_minor: minor })).min(1),
  /** a nozzle with its flange, by largest NPS and flange rating class */
  nozzles: z.array(z.object({ maxNps: z.number().positive(), rating: z.enum(['150', '300']), each_minor: minor })).min(1),
  sundries: z.object({
    tieRodPerMetre_minor: minor, gasketSet_minor: minor, boltingSet_minor: minor, paintPerM2_minor: minor,
    /** issue 11 (optional: a book saved before it prices these from the demo book, saying so): an impingement plate under a shell inlet, each */
    impingementPlate_minor: minor.optional(),
    /** issue 11: bending one U-tube of a U-tube (BEU) bundle, each */
    uBendPerTube_minor: minor.optional(),
  }),
  labourHours: z.object({
    perTubeEnd: z.number().min(0),
    perBaffle: z.number().min(0),
    perNozzle: z.number().min(0),
    fitUp: z.number().min(0),
    hydrotest: z.number().min(0),
    paint: z.number().min(0),
  }),
  shopRatePerHour_minor: minor,
  overhead_pct: pct,
  margin_pct: pct,
  /**
   * issue 11: design margin on heat-transfer area, %: every quoted design is sized for the required
   * tube length × (1 + margin), the shop's length round-up on top. Optional: a book saved before it
   * reads DEFAULT_DESIGN_MARGIN_PCT.
   */
  designMargin_pct: z.number().min(0, { error: 'The design margin must be between 0 and 50 %.' }).max(50, { error: 'The design margin must be between 0 and 50 %.' }).optional(),
  /**
   * issue 12: the shortest tube bundle (tube length per shell) the shop builds, m. Sizing never
   * offers a shorter one and a duty whose maximum length is below it is refused. Optional: a book
   * saved before it reads DEFAULT_MIN_TUBE_LENGTH_M.
   */
  minTubeLength_m: z.number().min(0.3, { error: 'The shortest bundle must be between 0.3 and 6 m.' }).max(6, { error: 'The shortest bundle must be between 0.3 and 6 m.' }).optional(),
  /**
   * issue 12: the largest shell inside diameter the shop builds, m. Optional: a book saved before it
   * reads the largest shell its heads table prices.
   */
  maxShellInnerDiameter_m: z.number().min(0.1, { error: 'The largest shell must be between 0.1 and 3 m.' }).max(3, { error: 'The largest shell must be between 0.1 and 3 m.' }).optional(),
  /** discount on the whole price from this many units up */
  quantityBreaks: z.array(z.object({ minQuantity: z.int().min(2), discount_pct: pct })),
  /** surcharge when the need-by date is inside the standard lead time */
  expedite_pct: pct,
  standardLeadTimeWeeks: z.int().min(1).max(104),
  deposit_pct: pct,
  cancellationFee_pct: pct,
  offerValidityDays: z.int().min(1).max(365),
});
export type PriceBook = z.infer<typeof priceBookSchema>;

/**
 * 10 %: design margin on area when the book states none. Common practice for a water-cooled
 * shell-and-tube cooler sized with film correlations good to ±10–25 % (the margin covers the
 * overall coefficient's uncertainty at its usual share of the resistance, not fouling, which is
 * allowed for separately by the fouling resistances).
 */
export const DEFAULT_DESIGN_MARGIN_PCT = 10;

/** The book's design margin, %, or the default for a book saved before the field. */
export const designMarginOf = (book: Pick<PriceBook, 'designMargin_pct'>): number => book.designMargin_pct ?? DEFAULT_DESIGN_MARGIN_PCT;

/** 1.0 m: the shortest bundle when the book states none (common practice: shorter bundles cost nearly as much to build). */
export const DEFAULT_MIN_TUBE_LENGTH_M = 1.0;

/**
 * The shop's limits (issue 12): the book's, or the defaults for a book saved before them: 1.0 m,
 * and the largest shell its heads table prices (a larger shell could not be priced anyway).
 */
export function shopLimitsOf(book: Pick<PriceBook, 'minTubeLength_m' | 'maxShellInnerDiameter_m' | 'heads'>): { minTubeLength_m: number; maxShellInnerDiameter_m: number } {
  return {
    minTubeLength_m: book.minTubeLength_m ?? DEFAULT_MIN_TUBE_LENGTH_M,
    maxShellInnerDiameter_m: book.maxShellInnerDiameter_m ?? Math.max(...book.heads.map((h) => h.maxShellDiameter_m)),
  };
}

export const priceLineGroups = ['material', 'labour', 'overhead', 'margin', 'discount', 'surcharge', 'extra'] as const;
export type PriceLineGroup = (typeof priceLineGroups)[number];

/** How people read each group of price lines (the workspace's headings). */
export const PRICE_GROUP_LABEL: Record<PriceLineGroup, string> = {
  material: 'Material',
  labour: 'Labour',
  overhead: 'Overhead',
  margin: 'Margin',
  discount: 'Discount',
  surcharge: 'Surcharge',
  extra: 'Added by sales (per order)',
};

/** One priced line; `source` says where the rate came from (price-book entry or an override). */
export const priceLineSchema = z.object({
  key: z.string(),
  group: z.enum(priceLineGroups),
  description: z.string(),
  quantity: z.number(),
  unit: z.string(),
  rate_minor: z.int(),
  amount_minor: z.int(),
  source: z.string(),
  /** present when a sales engineer overrode the computed amount */
  override: z.object({ computed_minor: z.int(), reason: z.string(), by: z.string() }).optional(),
  /** present on a line a sales engineer added (group `extra`): why, and who; internal */
  added: z.object({ kind: z.string(), description: z.string().optional(), reason: z.string(), by: z.string() }).optional(),
});
export type PriceLine = z.infer<typeof priceLineSchema>;

export const priceSchema = z.object({
  currency: z.enum(currencies),
  lines: z.array(priceLineSchema),
  /** per unit, before quantity */
  unit_minor: z.int(),
  quantity: z.int(),
  total_minor: z.int(),
  priceBookVersion: z.int(),
});
export type Price = z.infer<typeof priceSchema>;

/**
 * `PUT /api/admin/price-book` (admin): saves `priceBook` as the next version. `baseVersion` is the
 * version the edit started from: when another admin saved meanwhile the save is refused (409
 * `stale-version`) instead of silently reverting their change. `note` says what changed.
 */
export const savePriceBookSchema = z.object({
  priceBook: priceBookSchema,
  baseVersion: z.int({ error: 'must be the version the edit started from' }).min(1),
  note: z
    .string({ error: 'Say what changed.' })
    .trim()
    .min(1, { error: 'Say what changed.' })
    .max(500, { error: 'Use at most 500 characters.' })
    .refine((v) => !/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(v), { error: 'Remove control characters.' }),
});
export type SavePriceBook = z.infer<typeof savePriceBookSchema>;

/** One saved version in the history (`GET /api/admin/price-book/versions`). */
export interface PriceBookVersionSummary {
  version: number;
  note: string | null;
  /** name of the admin who saved it; null for the seeded book */
  createdBy: string | null;
  createdAt: string;
}

/** One changed value between two versions; a missing side (added or removed row) is null. */
export interface PriceBookChange {
  /** dotted path into the book, e.g. `tubes.3.perMetre_minor` */
  path: string;
  before: unknown;
  after: unknown;
}
