import { HttpError } from '../../lib/errors';

export type PricingErrorCode = 'no-price' | 'unknown-price-line' | 'override-out-of-range';

/**
 * A design the price book cannot price (`no-price`: the message names the missing entry), an
 * override of a line that does not exist, or one outside its bounds (`override-out-of-range`: the
 * message names the line). A 422 through the one error middleware.
 */
export class PricingError extends HttpError {
  declare readonly code: PricingErrorCode;
  constructor(code: PricingErrorCode, message: string) {
    super(422, code, message);
    this.name = 'PricingError';
  }
}

export const noPrice = (entry: string) =>
  new PricingError('no-price', `The price book has no entry for ${entry}; add it to the price book or change the design.`);
