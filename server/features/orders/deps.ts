import type Stripe from 'stripe';
import type { Jobs } from '../../lib/jobs';
import type { QuoteDeps } from '../quotes/deps';

export interface OrderDeps extends QuoteDeps {
  stripe: Stripe;
  /** the job queue: a cancellation queues its refund in the transaction that decides it */
  jobs?: Jobs;
}
