/**
 * Hard findings (issue 12): what makes a design unbuildable as it stands, in one list. A design with
 * any of them cannot be saved as a revision, approved or released to the shop; every other finding
 * in `rating.warnings` is soft (a caution the engineer weighs).
 *
 * Hard: the tubes do not fit the laid-out tubesheet (the same layout the drilling pattern uses,
 * tie rods placed), a wall too thin for its side (walls.ts WALL_HARD_CODES), a failed vibration
 * screen (vibration.ts), a nozzle wider than its shell allows (nozzles.ts), and, with the shop's
 * limits from the price book, a bundle shorter than the shortest it builds or a shell larger than
 * the largest. Pure; the server decides with it and the review workspace shows it.
 */
import type { Design } from '../../schemas/thermal';
import type { ThermalWarning } from '../errors';
import { tubeLayout } from '../geometry/layout';
import { MIN_PITCH_RATIO } from '../geometry/tubes';
import { metres, millimetres, type ShopLimits } from '../shop-limits';
import { WALL_HARD_CODES } from './walls';

/** Codes of hard findings; a rating warning with one of these codes is hard, never soft. */
export const HARD_CODES = ['tubes-do-not-fit', 'shell-too-small', ...WALL_HARD_CODES, 'vibration', 'vibration-fluidelastic', 'vibration-vortex', 'nozzle-too-large', 'below-shop-minimum-length', 'beyond-shop-largest-shell'];

/** What the check reads: the bundle's geometry and, where rated, its warnings and screens. */
export type HardInput = Pick<Design, 'tubeCount' | 'tubeLength_m' | 'tubeOuterDiameter_m' | 'tubePasses' | 'shellInnerDiameter_m' | 'layout' | 'tubePitch_m'> & {
  rating: Pick<Design['rating'], 'warnings' | 'vibration' | 'nozzlesOk'>;
};

/** Tubes the design's laid-out tubesheet holds (tie rods placed), or undefined without a shell or layout. */
export function tubesheetHolds(d: HardInput): number | undefined {
  if (d.shellInnerDiameter_m === undefined || d.layout === undefined) return undefined;
  return tubeLayout({
    shellInnerDiameter_m: d.shellInnerDiameter_m,
    tubeOuterDiameter_m: d.tubeOuterDiameter_m,
    tubePitch_m: d.tubePitch_m ?? MIN_PITCH_RATIO * d.tubeOuterDiameter_m,
    layout: d.layout,
    tubePasses: d.tubePasses,
  }).tubeCount;
}

/** The design's hard findings, most basic first; `shop` adds the price book's limits. Empty: buildable. */
export function hardFindings(d: HardInput, shop?: ShopLimits): ThermalWarning[] {
  const out: ThermalWarning[] = [];
  const holds = tubesheetHolds(d);
  if (holds !== undefined && holds < d.tubeCount) {
    out.push({
      code: 'tubes-do-not-fit',
      message: `${d.tubeCount} tubes do not fit: the ${millimetres(d.shellInnerDiameter_m!)} shell's tubesheet, laid out at this pitch, layout and ${d.tubePasses} pass${d.tubePasses > 1 ? 'es' : ''} with its tie rods, holds ${holds}. Use at most ${holds} tubes or a larger shell.`,
    });
  }
  const warnings = d.rating.warnings ?? [];
  out.push(...warnings.filter((w) => WALL_HARD_CODES.includes(w.code)));
  if (d.rating.vibration?.ok === false) {
    const why = warnings.filter((w) => w.code.startsWith('vibration-')).map((w) => w.message.replace(/^Fails: /, ''));
    out.push({ code: 'vibration', message: `The bundle fails the vibration screen${why.length ? `: ${why.join(' ')}` : '.'}` });
  }
  const nozzles = warnings.filter((w) => w.code === 'nozzle-too-large');
  if (nozzles.length) out.push(...nozzles);
  else if (d.rating.nozzlesOk === false) out.push({ code: 'nozzle-too-large', message: 'A nozzle this flow needs is wider than half the shell: a larger shell or a lower flow is needed.' });
  if (shop && d.tubeLength_m < shop.minTubeLength_m - 1e-9) {
    out.push({
      code: 'below-shop-minimum-length',
      message: `The tube length ${metres(d.tubeLength_m)} is below the shortest bundle this shop builds, ${metres(shop.minTubeLength_m)}.`,
    });
  }
  if (shop && d.shellInnerDiameter_m !== undefined && d.shellInnerDiameter_m > shop.maxShellInnerDiameter_m + 5e-4) {
    out.push({
      code: 'beyond-shop-largest-shell',
      message: `The ${millimetres(d.shellInnerDiameter_m)} shell is larger than the largest this shop builds, ${millimetres(shop.maxShellInnerDiameter_m)} inside diameter.`,
    });
  }
  return out;
}

/** The rating's warnings that are not hard (shown as cautions beside the hard list). */
export function softFindings(d: { rating: { warnings: ThermalWarning[] } }): ThermalWarning[] {
  return (d.rating.warnings ?? []).filter((w) => !HARD_CODES.includes(w.code));
}

/** One sentence for a refusal: "Cannot be built as it stands: …". */
export function hardFindingsMessage(findings: ThermalWarning[]): string {
  return `Cannot be built as it stands: ${findings.map((f) => f.message.replace(/\.?$/, '.')).join(' ')}`;
}
