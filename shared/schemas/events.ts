/**
 * Every kind of event a quote or an order records, and the ONE place that decides whether a customer
 * may see it (their pages, their e-mails, their PDFs). Staff see all of them. A new kind must be added
 * here with its decision: the records below are total over the kinds, so the type check refuses a
 * kind without one, and the API test of event visibility walks every kind.
 */
import { z } from 'zod';

export const quoteEventKinds = [
  'submitted', 'assigned', 'edited', 'note', 'approved', 'questions', 'declined', 'change-requested', 'attachment', 'accepted', 'ordered',
] as const;
export const quoteEventKindSchema = z.enum(quoteEventKinds);
export type QuoteEventKind = z.infer<typeof quoteEventKindSchema>;

export const orderEventKinds = ['step', 'note', 'hold-reason', 'hydrotest-passed', 'hydrotest-failed'] as const;
export const orderEventKindSchema = z.enum(orderEventKinds);
export type OrderEventKind = z.infer<typeof orderEventKindSchema>;

export type Audience = 'customer' | 'staff';

/** Who sees each quote event: `customer` = the customer and staff, `staff` = staff only. */
export const QUOTE_EVENT_AUDIENCE: Record<QuoteEventKind, Audience> = {
  submitted: 'customer', // the customer's own request and notes
  assigned: 'staff', // which sales engineer took it
  edited: 'staff', // sales' working revisions
  note: 'staff', // sales' internal notes (e.g. for the shop)
  approved: 'customer', // the offer and sales' message with it
  questions: 'customer',
  declined: 'customer',
  'change-requested': 'customer', // the customer's own request
  attachment: 'customer',
  accepted: 'customer',
  ordered: 'customer',
};

/** Who sees each order event. */
export const ORDER_EVENT_AUDIENCE: Record<OrderEventKind, Audience> = {
  step: 'customer', // the order reached a step; its note is written for the customer (wording on hold, waybill, cancellation)
  note: 'staff', // a note of sales or the shop to each other (paint colour, rework)
  'hold-reason': 'staff', // why the shop put the order on hold
  'hydrotest-passed': 'customer', // one side passed: the customer reads the pressure and the pass
  'hydrotest-failed': 'staff', // a failed side is repaired and tested again in the shop
};

export const customerSeesQuoteEvent = (kind: string): boolean => QUOTE_EVENT_AUDIENCE[kind as QuoteEventKind] === 'customer';
export const customerSeesOrderEvent = (kind: string): boolean => ORDER_EVENT_AUDIENCE[kind as OrderEventKind] === 'customer';
