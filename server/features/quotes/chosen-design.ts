/**
 * "Request this design" (issue 12): the customer picked one design on the sizing page; the quote
 * stores that same design when it is still valid, else the recommended one with the reason. Valid:
 * among the designs sized with the price book (same geometry and length), or, rated as given with
 * the book, meeting the target outlet, both pressure-drop limits, every operating case, the book's
 * design margin on area and the shop's rules (no hard finding).
 */
import { designMarginOf, shopLimitsOf } from '../../../shared/schemas/price-book';
import type { ChosenDesign, DesignChoice } from '../../../shared/schemas/quotes';
import type { Design, SizeRequest } from '../../../shared/schemas/thermal';
import { hardFindings } from '../../../shared/thermal/checks/hard-findings';
import { ThermalInputError } from '../../../shared/thermal/errors';
import type { Config } from '../../lib/config';
import { HttpError } from '../../lib/errors';
import { evaluateWithBook, type ActiveBook } from './pricing-port';

/** 0.05 K: an outlet this close above the target counts as met (as for operating cases). */
const OUTLET_TOLERANCE_K = 0.05;

const near = (a: number | undefined, b: number | undefined) =>
  a === b || (a !== undefined && b !== undefined && Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b)));

/** Same geometry and length (defaults as the readers take them: tubes, one shell, cut 0.25). */
export function sameDesign(d: Design, c: ChosenDesign): boolean {
  return (
    d.tubeCount === c.tubeCount &&
    d.tubePasses === c.tubePasses &&
    d.tubeMaterial === c.tubeMaterial &&
    d.layout === c.layout &&
    (d.processSide ?? 'tubes') === (c.processSide ?? 'tubes') &&
    (d.shellsInSeries ?? 1) === (c.shellsInSeries ?? 1) &&
    near(d.tubeLength_m, c.tubeLength_m) &&
    near(d.tubeOuterDiameter_m, c.tubeOuterDiameter_m) &&
    near(d.tubeWall_m, c.tubeWall_m) &&
    near(d.shellInnerDiameter_m, c.shellInnerDiameter_m) &&
    near(d.baffleSpacing_m, c.baffleSpacing_m) &&
    near(d.baffleCut ?? (d.shellInnerDiameter_m === undefined ? undefined : 0.25), c.baffleCut ?? (c.shellInnerDiameter_m === undefined ? undefined : 0.25))
  );
}

/** Why a design rated as given does not do for the quote, or null when it does. */
function whyNot(d: Design, duty: SizeRequest, book: ActiveBook): string | null {
  const r = d.rating;
  const c = duty.constraints;
  const target = duty.process.outletTemp_C;
  if (r.outletTemp_C > target + OUTLET_TOLERANCE_K) return `it cools the process to ${r.outletTemp_C.toFixed(1)} °C, not to the target ${target} °C`;
  if (r.pressureDrop.total_Pa > c.maxPressureDrop_Pa) return `its tube-side pressure drop ${(r.pressureDrop.total_Pa / 1000).toFixed(1)} kPa is above the limit ${(c.maxPressureDrop_Pa / 1000).toFixed(1)} kPa`;
  const shellMax = c.maxShellPressureDrop_Pa ?? c.maxPressureDrop_Pa;
  if ((r.shellPressureDrop_Pa ?? 0) > shellMax) return `its shell-side pressure drop ${((r.shellPressureDrop_Pa ?? 0) / 1000).toFixed(1)} kPa is above the limit ${(shellMax / 1000).toFixed(1)} kPa`;
  const failed = d.cases?.find((k) => k.meets === false);
  if (failed) return `it does not meet the operating case "${failed.name}"`;
  const margin = Math.max(designMarginOf(book.data), c.designMargin_pct ?? 0);
  if (d.overSurface_pct < margin - 0.05) return `its area margin is ${d.overSurface_pct.toFixed(1)} %, below the design margin of ${margin} % every quoted design carries`;
  const hard = hardFindings(d, shopLimitsOf(book.data));
  if (hard.length) return hard.map((h) => h.message).join(' ');
  return null;
}

/**
 * The design to store: the chosen one when valid (the others become the alternatives), else the
 * sized recommendation and the reason in `choice.note`.
 */
export async function keepChosen(
  config: Config,
  duty: SizeRequest,
  book: ActiveBook,
  sized: { design: Design; alternatives: Design[] },
  chosen: ChosenDesign | undefined,
): Promise<{ design: Design; alternatives: Design[]; choice?: DesignChoice }> {
  if (!chosen) return sized;
  const all = [sized.design, ...sized.alternatives];
  const i = all.findIndex((d) => sameDesign(d, chosen));
  if (i >= 0) return { design: all[i]!, alternatives: all.filter((_, k) => k !== i), choice: { kept: true } };
  const instead = 'We stored our recommended design for this duty instead.';
  if (chosen.layout === undefined || chosen.shellInnerDiameter_m === undefined) {
    return { ...sized, choice: { kept: false, note: `The design you chose is not among the designs we size for this duty. ${instead}` } };
  }
  let rated: Design;
  try {
    rated = await evaluateWithBook(config, duty, { ...chosen, layout: chosen.layout, shellInnerDiameter_m: chosen.shellInnerDiameter_m }, book);
  } catch (err) {
    if (!(err instanceof ThermalInputError) && !(err instanceof HttpError && err.status === 422)) throw err;
    return { ...sized, choice: { kept: false, note: `The design you chose cannot be rated for this duty: ${err.message} ${instead}` } };
  }
  const why = whyNot(rated, duty, book);
  if (why) return { ...sized, choice: { kept: false, note: `The design you chose no longer does: ${why}. ${instead}` } };
  return { design: rated, alternatives: all, choice: { kept: true } };
}
