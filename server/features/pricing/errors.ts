import { HttpError } from '../../lib/errors';

export type PricingErrorCode = 'no-price' | 'unknown-price-line';

/**
 * A design the price book cannot price (`no-price`: the message names the missing entry) or an
 * override of a line that does not exist. A 422 through the one error middleware.
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
