/**
 * Stripe's test PaymentMethods that this fake understands (names as in Stripe's testing docs,
 * https://docs.stripe.com/testing#cards). Only ids are exchanged: no card number exists anywhere here.
 */
export interface TestCard {
  brand: string;
  last4: string;
  decline?: { code: 'card_declined'; decline_code: string; message: string };
}

export const TEST_CARDS: Record<string, TestCard> = {
  pm_card_visa: { brand: 'visa', last4: '4242' },
  pm_card_mastercard: { brand: 'mastercard', last4: '4444' },
  pm_card_chargeDeclined: {
    brand: 'visa',
    last4: '0002',
    decline: { code: 'card_declined', decline_code: 'generic_decline', message: 'Your card was declined.' },
  },
  pm_card_chargeDeclinedInsufficientFunds: {
    brand: 'visa',
    last4: '9995',
    decline: { code: 'card_declined', decline_code: 'insufficient_funds', message: 'Your card has insufficient funds.' },
  },
};
