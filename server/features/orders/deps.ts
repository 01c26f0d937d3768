import type Stripe from 'stripe';
import type { QuoteDeps } from '../quotes/deps';

export interface OrderDeps extends QuoteDeps {
  stripe: Stripe;
}
