/**
 * The guard rail on unbuildable designs (issue 12): a revision is saved and an offer approved only
 * when the design has no hard finding (shared/thermal/checks/hard-findings.ts) under the active
 * price book's shop limits. Soft findings stay warnings on the design.
 */
import { shopLimitsOf, type PriceBook } from '../../../shared/schemas/price-book';
import type { Design } from '../../../shared/schemas/thermal';
import { hardFindings, hardFindingsMessage } from '../../../shared/thermal/checks/hard-findings';
import type { ThermalWarning } from '../../../shared/thermal/errors';
import type { ShopLimits } from '../../../shared/thermal/shop-limits';
import { unprocessable } from '../../lib/errors';
import type { QuoteDeps } from './deps';
import { activeBook } from './pricing-port';

/** The design field each hard finding blames, so the form can show it at the field. */
const FIELD: Record<string, string> = {
  'tubes-do-not-fit': 'design.tubeCount',
  'tube-wall-thin': 'design.tubeWall_m',
  'shell-wall-thin': 'design.shellInnerDiameter_m',
  vibration: 'design.baffleSpacing_m',
  'nozzle-too-large': 'design.shellInnerDiameter_m',
  'below-shop-minimum-length': 'design.tubeLength_m',
  'beyond-shop-largest-shell': 'design.shellInnerDiameter_m',
};

/** `GET /api/quotes/shop-limits` (sales, admin): the active book's shortest bundle and largest shell. */
export async function shopLimits(deps: QuoteDeps): Promise<ShopLimits> {
  return shopLimitsOf((await activeBook(deps)).data);
}

/** The design's hard findings under the book's shop limits. */
export function hardFindingsWithBook(design: Design, book: PriceBook): ThermalWarning[] {
  return hardFindings(design, shopLimitsOf(book));
}

/** 422 `not-buildable` naming every hard finding; `action` says what was refused ("saved", "approved"). */
export function assertBuildable(design: Design, book: PriceBook, action: string): void {
  const found = hardFindingsWithBook(design, book);
  if (found.length === 0) return;
  const fields: Record<string, string> = {};
  for (const f of found) fields[FIELD[f.code] ?? 'design'] ??= f.message;
  throw unprocessable(`This design cannot be ${action}. ${hardFindingsMessage(found)}`, 'not-buildable', fields);
}
