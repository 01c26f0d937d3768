/** A baffled shell's geometry and the shell-side findings (velocity window, method range, L/D, fill). */
import type { ThermalWarning } from '../errors';
import { legacyBaffleSpacing } from '../geometry/baffles';
import type { Layout } from '../geometry/layout';
import type { ShellMethodEntry, ShellSideResult } from './shell-methods';

export interface ShellGeometry {
  dShell: number;
  /** central baffle spacing, m */
  baffleSpacing: number;
  baffleCut: number;
  pitch: number;
  layout: Layout;
  /** end spacings at the nozzles, m (default: bafflePlan's rule) */
  inletSpacing?: number;
  outletSpacing?: number;
}

/** Old default spacing, for designs stored without one: 0.4 D_s, at least 50.8 mm (common practice). */
export function defaultBaffleSpacing(dShell: number, tubeLength: number): number {
  return legacyBaffleSpacing(dShell, tubeLength);
}

/** 0.3–1 m/s: liquids on the shell side (domain brief 2.4, common practice). */
export const SHELL_LIQUID_VELOCITY = [0.3, 1] as const;
/** 3–15: tube length over shell ID of one shell (common practice). */
export const SHELL_ASPECT = [3, 15] as const;
/** 0.85: below this share of what the laid-out tubesheet holds, a shell is partly filled (common practice). */
export const SHELL_FILL_MIN = 0.85;

export function shellWarnings(s: ShellGeometry, side: ShellSideResult, method: ShellMethodEntry, liquid: boolean, tubeLength: number, fill: number | undefined): ThermalWarning[] {
  const out: ThermalWarning[] = [];
  if (side.re < method.validity.reMin || side.re > method.validity.reMax) {
    out.push({ code: 'shell-correlation-range', message: `Shell-side Re = ${Math.round(side.re)} is outside the range of ${method.label} (${method.validity.reMin}–${method.validity.reMax.toExponential(0)}): the shell-side coefficient is uncertain.` });
  }
  if (s.baffleCut < method.validity.cutMin || s.baffleCut > method.validity.cutMax) {
    out.push({ code: 'shell-baffle-cut', message: `${method.label} is fitted to baffle cuts of ${Math.round(method.validity.cutMin * 100)}–${Math.round(method.validity.cutMax * 100)} %; ${Math.round(s.baffleCut * 100)} % is outside it.` });
  }
  const [vLo, vHi] = SHELL_LIQUID_VELOCITY;
  if (liquid && side.velocity < vLo) out.push({ code: 'shell-velocity-low', message: `Shell-side velocity ${side.velocity.toFixed(2)} m/s is below about ${vLo} m/s: liquids foul at low velocity (common practice). Closer baffles raise it.` });
  if (liquid && side.velocity > vHi) out.push({ code: 'shell-velocity-high', message: `Shell-side velocity ${side.velocity.toFixed(2)} m/s is above about ${vHi} m/s for liquids (common practice): risk of erosion and vibration. Wider baffle spacing lowers it.` });
  const aspect = tubeLength / s.dShell;
  if (aspect < SHELL_ASPECT[0] || aspect > SHELL_ASPECT[1]) {
    out.push({ code: 'shell-aspect', message: `Tube length over shell diameter is ${aspect.toFixed(1)}, outside about ${SHELL_ASPECT[0]}–${SHELL_ASPECT[1]} (common practice): ${aspect < SHELL_ASPECT[0] ? 'a short, wide shell distributes the shell-side flow poorly and costs more per m²' : 'a long, slender shell is hard to support, ship and pull'}.` });
  }
  if (fill !== undefined && fill < SHELL_FILL_MIN) {
    out.push({ code: 'shell-partly-filled', message: `The shell holds ${Math.round(fill * 100)} % of the tubes its tubesheet could take: the empty space lets shell-side flow bypass the bundle (use dummy tubes or sealing strips, or a smaller shell).` });
  }
  return out;
}
