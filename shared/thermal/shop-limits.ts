/**
 * The shop's stated limits (issue 12), from the price book: the shortest bundle it builds and the
 * largest shell. A sizing never offers a design outside them (a bundle the search solves shorter is
 * made the shortest length the shop builds, more surface than needed), and a duty whose own limits
 * fall below them is refused with the limit named, before any search.
 */
import type { SizeRequest } from '../schemas/thermal';
import { ThermalInputError } from './errors';

export interface ShopLimits {
  /** the shortest tube bundle (tube length per shell) the shop builds, m */
  minTubeLength_m: number;
  /** the largest shell inside diameter the shop builds, m */
  maxShellInnerDiameter_m: number;
}

/** `1.0 m`, `0.25 m`, `0.2 m`: lengths as the messages print them. */
export const metres = (m: number) => `${Number.isInteger(m) ? m.toFixed(1) : Number(m.toFixed(2))} m`;
/** `1,500 mm` */
export const millimetres = (m: number) => `${Math.round(m * 1000).toLocaleString('en-US')} mm`;

/** Refuses a duty whose limits fall below the shop's floors (422 naming the duty's field). */
export function assertDutyWithinShop(req: SizeRequest, shop: ShopLimits): void {
  const max = req.constraints.maxTubeLength_m;
  if (max < shop.minTubeLength_m - 1e-9) {
    throw new ThermalInputError(
      'below-shop-minimum-length',
      `The maximum tube length ${metres(max)} is below the shortest bundle this shop builds, ${metres(shop.minTubeLength_m)}: allow at least ${metres(shop.minTubeLength_m)}.`,
      'constraints.maxTubeLength_m',
    );
  }
}

/** The request the search runs: the duty's shell limit, at most the shop's largest shell. */
export function withinShop(req: SizeRequest, shop: ShopLimits): SizeRequest {
  const own = req.constraints.maxShellInnerDiameter_m;
  if (own !== undefined && own <= shop.maxShellInnerDiameter_m) return req;
  return { ...req, constraints: { ...req.constraints, maxShellInnerDiameter_m: shop.maxShellInnerDiameter_m } };
}

/** The shop's shell limit is tighter than the duty's own (or the duty states none). */
export function shopShellBinds(req: SizeRequest, shop: ShopLimits): boolean {
  const own = req.constraints.maxShellInnerDiameter_m;
  return own === undefined || own > shop.maxShellInnerDiameter_m + 1e-9;
}

/**
 * The refusal when the duty fits only a shell larger than the shop builds: `needed` is the design
 * the sizing finds without the shop's shell limit (the smallest shell it would take).
 */
export function beyondShopShell(needed: { shellInnerDiameter_m?: number }, shop: ShopLimits): ThermalInputError {
  const d = needed.shellInnerDiameter_m;
  return new ThermalInputError(
    'beyond-shop-largest-shell',
    `This duty fits only a shell larger than this shop builds: it needs ${d !== undefined ? `a ${millimetres(d)} shell` : 'a larger shell'}, and the largest we build is ${millimetres(shop.maxShellInnerDiameter_m)} inside diameter. Split the duty over several coolers or lower a flow.`,
    'constraints.maxShellInnerDiameter_m',
  );
}
