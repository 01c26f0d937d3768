/** Orders: who sees which, and the shop's steps from release to shipment. */
import type { SessionUser } from '../../../shared/schemas/auth';
import { customerSeesOrderEvent } from '../../../shared/schemas/events';
import { HOLD_WORDINGS, orderSteps, type ListOrdersQuery, type Order, type OrderStatus } from '../../../shared/schemas/orders';
import type { advanceOrderSchema } from '../../../shared/schemas/orders';
import { isStaff } from '../../lib/auth/guards';
import { badRequest, forbidden, HttpError, notFound } from '../../lib/errors';
import type { Executor } from '../../lib/sql-adapter';
import { getPriceBookVersion } from '../pricing/repository';
import * as quoteRepo from '../quotes/repository';
import type { OrderDeps } from './deps';
import { hydrotestDetail, hydrotestState, SIDE_NAME } from './hydrotest';
import { notifyStep } from './notify';
import { queueRefund } from './refunds';
import { assertReleasable } from './releasable';
import * as repo from './repository';

export async function loadOrder(deps: OrderDeps, viewer: SessionUser, id: string) {
  const row = await repo.findOrder(deps.db, id);
  if (!row || (!isStaff(viewer) && row.organizationId !== viewer.organizationId)) throw notFound('No such order.');
  return row;
}

export async function getOrder(deps: OrderDeps, viewer: SessionUser, id: string): Promise<Order> {
  const row = await loadOrder(deps, viewer, id);
  const [revision, events] = await Promise.all([quoteRepo.findRevision(deps.db, row.quoteId, row.revisionNumber), repo.timeline(deps.db, id)]);
  const staff = isStaff(viewer);
  // the customer gets only the kinds shared/schemas/events.ts gives them
  const seen = staff ? events : events.filter((e) => customerSeesOrderEvent(e.kind));
  return {
    id: row.id,
    number: row.number,
    quoteId: row.quoteId,
    quoteNumber: row.quoteNumber,
    revisionNumber: row.revisionNumber,
    organizationId: row.organizationId,
    organizationName: row.organizationName,
    status: row.status,
    heldFrom: row.heldFrom,
    poNumber: row.poNumber,
    needBy: row.needBy,
    total_minor: row.totalMinor,
    deposit_minor: row.depositMinor,
    refunded_minor: row.refundedMinor,
    currency: row.currency,
    design: revision!.data.design,
    quantity: revision!.data.price.quantity,
    timeline: seen.map((e) => {
      const detail = staff && e.kind.startsWith('hydrotest-') ? hydrotestDetail(e.data) : undefined;
      return { kind: e.kind, status: e.status, note: e.note, by: e.by, at: new Date(e.at).toISOString(), ...(detail ? { detail } : {}) };
    }),
    createdAt: new Date(row.createdAt).toISOString(),
    updatedAt: new Date(row.updatedAt).toISOString(),
  };
}

export async function listOrders(deps: OrderDeps, viewer: SessionUser, query: ListOrdersQuery) {
  const { items, total } = await repo.listOrders(deps.db, query, isStaff(viewer) ? undefined : viewer.organizationId);
  return {
    items: items.map((o) => ({
      id: o.id, number: o.number, quoteId: o.quoteId, quoteNumber: o.quoteNumber, organizationName: o.organizationName,
      status: o.status, poNumber: o.poNumber, needBy: o.needBy, total_minor: o.totalMinor, currency: o.currency,
      createdAt: new Date(o.createdAt).toISOString(), updatedAt: new Date(o.updatedAt).toISOString(),
    })),
    total,
    page: query.page,
    pageSize: query.pageSize,
  };
}

/** What a move writes besides the step: the step's note is the customer's; staff notes are their own events. */
type MoveNotes = { customer?: string | null; staff?: { kind: 'note' | 'hold-reason'; text: string }[] };

/**
 * Moves the order on in one transaction with its timeline events and its e-mail (and `then`, e.g. a
 * refund job); the update is conditional on `from`, so of two concurrent moves exactly one wins and
 * the other gets 409 with nothing written. Only `notes.customer` reaches the customer's timeline and
 * e-mail; staff notes are events of kinds the customer never sees.
 */
async function move(
  deps: OrderDeps, user: SessionUser, id: string, from: OrderStatus, to: OrderStatus, notes: MoveNotes = {},
  extra: Partial<typeof repo.orders.$inferInsert> = {}, then?: (tx: Executor) => Promise<void>,
) {
  await deps.db.transaction(async (tx) => {
    const ok = await repo.moveOrder(tx, id, from, { status: to, ...extra });
    if (!ok) throw new HttpError(409, 'stale-status', 'The order moved on meanwhile; reload it.');
    await repo.addEvent(tx, id, user.id, to, notes.customer ?? null);
    for (const n of notes.staff ?? []) if (n.text) await repo.addEvent(tx, id, user.id, to, n.text, null, n.kind);
    await notifyStep(deps, tx, id, to, notes.customer);
    await then?.(tx);
  });
  return getOrder(deps, user, id);
}

/** Sales hand a paid order to the shop. */
export async function releaseOrder(deps: OrderDeps, user: SessionUser, id: string, note?: string) {
  const row = await loadOrder(deps, user, id);
  if (row.status !== 'deposit-paid') throw new HttpError(409, 'wrong-status', `Only an order with its deposit paid can be released; this one is ${row.status}.`);
  await assertReleasable(deps, user, id);
  return move(deps, user, id, 'deposit-paid', 'released', { staff: note ? [{ kind: 'note', text: note }] : [] });
}

type Advance = ReturnType<typeof advanceOrderSchema.parse>;

/**
 * The shop moves an order one step on (or on hold, and back). On hold needs a reason (staff) and the
 * wording the customer reads. Leaving the hydrotest needs the latest test of both sides passed
 * (hydrotest.ts); a failed side keeps the order at the hydrotest.
 */
export async function advanceOrder(deps: OrderDeps, user: SessionUser, id: string, input: Advance) {
  const row = await loadOrder(deps, user, id);
  const from = row.status;
  const notes: MoveNotes = { customer: input.customerNote, staff: input.note ? [{ kind: 'note', text: input.note }] : [] };
  if (from === 'on-hold') {
    if (input.to !== row.heldFrom) throw new HttpError(409, 'wrong-step', `An order on hold resumes at the step it left: ${row.heldFrom}.`);
    return move(deps, user, id, from, input.to, notes, { heldFrom: null });
  }
  const at = orderSteps.indexOf(from as (typeof orderSteps)[number]);
  if (at < orderSteps.indexOf('released') || from === 'shipped') {
    throw new HttpError(409, 'wrong-status', `The shop moves orders from release to shipment; this one is ${from}.`);
  }
  if (input.to === 'on-hold') {
    const fields: Record<string, string> = {};
    if (!input.reason) fields.reason = 'Say why the order is on hold (staff read it).';
    if (!input.customerWording) fields.customerWording = 'Choose what the customer reads.';
    if (Object.keys(fields).length) throw badRequest('Putting an order on hold needs a reason and the wording the customer reads.', fields);
    notes.customer = HOLD_WORDINGS[input.customerWording!];
    notes.staff = [{ kind: 'hold-reason', text: input.reason! }, ...notes.staff!];
    return move(deps, user, id, from, 'on-hold', notes, { heldFrom: from });
  }
  const next = orderSteps[at + 1];
  if (input.to !== next) throw new HttpError(409, 'wrong-step', `The next step after ${from} is ${next}, not ${input.to}.`);
  // checked inside the move's transaction, after its update holds the order's row: a test recorded
  // meanwhile (hydrotest.ts locks the same row) is either seen here or refused there
  const bothSidesPassed = async (tx: Executor) => {
    const test = await hydrotestState(deps, tx, row);
    if (test.passed) return;
    const open = test.sides.filter((s) => !s.latest?.passed);
    const fields = Object.fromEntries(open.map((s) => [s.side, s.latest ? 'its latest test failed: repair, then test again' : 'not tested yet']));
    throw new HttpError(409, 'hydrotest-not-passed', `The order stays at the hydrotest until both sides pass: ${open.map((s) => `${SIDE_NAME[s.side].toLowerCase()} ${fields[s.side]}`).join('; ')}.`, fields);
  };
  return move(deps, user, id, from, next!, notes, {}, from === 'hydrotest' ? bothSidesPassed : undefined);
}

const BEFORE_FABRICATION: OrderStatus[] = ['deposit-paid', 'released'];

/**
 * Cancellation: before fabrication starts the buyer or sales may cancel (the deposit back, less the
 * price book's cancellation fee once released); after that only an admin. `from` is the status the
 * canceller saw: when the order moved on meanwhile (a release in the same moment) the cancel gets 409.
 *
 * The status change, the refund due, its job and the e-mail commit together: a cancel that loses a
 * race never reaches the payment service. The refund job (refunds.ts) asks Stripe for the refund
 * with an idempotency key per order; the `charge.refunded` webhook records it.
 */
export async function cancelOrder(deps: OrderDeps, user: SessionUser, id: string, reason: string, from?: OrderStatus) {
  const row = await loadOrder(deps, user, id);
  if (from && from !== row.status) throw new HttpError(409, 'stale-status', `The order moved on meanwhile (it is ${row.status} now); reload it.`);
  if (row.status === 'cancelled' || row.status === 'shipped') throw new HttpError(409, 'wrong-status', `An order that is ${row.status} cannot be cancelled.`);
  const started = !BEFORE_FABRICATION.includes(row.status);
  if (user.role === 'shop' || (started && user.role !== 'admin')) throw forbidden('Fabrication has started: only an admin can cancel this order now.');
  const revision = (await quoteRepo.findRevision(deps.db, row.quoteId, row.revisionNumber))!;
  const book = await getPriceBookVersion(deps.db, revision.priceBookVersion);
  const fee = row.status === 'deposit-paid' ? 0 : Math.min(row.depositMinor, Math.round((row.totalMinor * book.cancellationFee_pct) / 100));
  const refund = row.depositMinor - fee;
  const jobs = deps.jobs;
  if (refund > 0 && !jobs) throw new Error('cancelOrder: no job queue to request the refund from');
  const note = `Cancelled: ${reason} Refund ${refund} of ${row.depositMinor} (minor units)${fee ? `, cancellation fee ${fee}` : ''}.`;
  // decided from `row`; the move is conditional on row.status, so the decision holds when it commits
  return move(deps, user, id, row.status, 'cancelled', { customer: note }, { heldFrom: null, refundDueMinor: refund, refundStatus: refund > 0 ? 'pending' : 'none' }, async (tx) => {
    if (refund > 0) await queueRefund(jobs!, tx, id);
  });
}
