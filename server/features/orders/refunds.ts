/**
 * Refunds of cancelled orders, asked of the payment service from a job, never from the request that
 * cancels: the cancellation decides the amount (orders.refund_due_minor, refund_status 'pending')
 * and queues this job in the same transaction. The job asks Stripe with the idempotency key
 * `refund-<orderId>`, so a retried job never refunds twice; it marks the refund 'requested', or
 * 'failed' with the error after the last retry. The `charge.refunded` webhook marks it 'refunded'.
 */
import { and, eq, sql } from 'drizzle-orm';
import type PgBoss from 'pg-boss';
import type Stripe from 'stripe';
import type { Db } from '../../../db';
import { QUEUES, type Jobs } from '../../lib/jobs';
import { jobsDb, type Executor } from '../../lib/sql-adapter';
import * as repo from './repository';

interface RefundJob {
  orderId: string;
}

/** Retries for about an hour while the payment service is down (pg-boss: 5 s doubling, 10 retries). */
const RETRY = { retryLimit: 10, retryDelay: 5, retryBackoff: true } as const;

export async function queueRefund(jobs: Jobs, tx: Executor, orderId: string) {
  await jobs.send(QUEUES.refund, { orderId } satisfies RefundJob, { ...RETRY, db: jobsDb(tx) });
}

export async function startRefundWorker(jobs: Jobs, db: Db, stripe: Stripe): Promise<void> {
  await jobs.work<RefundJob>(QUEUES.refund, { pollingIntervalSeconds: 0.5, batchSize: 1, includeMetadata: true }, async ([job]) => {
    if (job) await refundOne(db, stripe, job);
  });
}

async function refundOne(db: Db, stripe: Stripe, job: PgBoss.JobWithMetadata<RefundJob>) {
  const { orderId } = job.data;
  const order = await repo.findOrder(db, orderId);
  const [state] = await db.select({ due: repo.orders.refundDueMinor, status: repo.orders.refundStatus }).from(repo.orders).where(eq(repo.orders.id, orderId));
  if (!order || !state || state.due <= 0 || (state.status !== 'pending' && state.status !== 'failed')) return; // nothing (more) to ask
  try {
    await stripe.refunds.create(
      { payment_intent: order.paymentIntentId, amount: state.due, metadata: { orderId } },
      { idempotencyKey: `refund-${orderId}` },
    );
  } catch (err) {
    const last = job.retryCount >= job.retryLimit;
    const message = (err as Error).message.slice(0, 2000);
    await db
      .update(repo.orders)
      .set({ refundError: message, refundStatus: last ? 'failed' : 'pending', updatedAt: sql`now()` })
      .where(and(eq(repo.orders.id, orderId), eq(repo.orders.refundStatus, state.status)));
    console.error(`[refunds] order ${orderId}, attempt ${job.retryCount + 1}: ${message}`);
    throw err; // pg-boss retries the job later
  }
  // the webhook may have recorded the refund already: only a pending refund becomes 'requested'
  await db
    .update(repo.orders)
    .set({ refundStatus: 'requested', refundError: null, updatedAt: sql`now()` })
    .where(and(eq(repo.orders.id, orderId), sql`${repo.orders.refundStatus} in ('pending', 'failed')`));
}
