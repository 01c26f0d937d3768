/**
 * Orders: an accepted offer whose deposit is paid, built by the shop step by step.
 * The steps in order; `on-hold` and `cancelled` can interrupt them.
 */
import { z } from 'zod';
import { designSchema } from './thermal';

export const orderSteps = ['deposit-paid', 'released', 'cutting', 'tubing', 'shell-and-heads', 'hydrotest', 'ready-to-ship', 'shipped'] as const;
export const orderStatuses = [...orderSteps, 'on-hold', 'cancelled'] as const;
export const orderStatusSchema = z.enum(orderStatuses);
export type OrderStatus = z.infer<typeof orderStatusSchema>;

/** How people read each step (our wording). */
export const ORDER_STATUS_LABEL: Record<OrderStatus, string> = {
  'deposit-paid': 'Deposit paid',
  released: 'Released to the shop',
  cutting: 'Cutting',
  tubing: 'Tubing, expanding and welding',
  'shell-and-heads': 'Shell and heads',
  hydrotest: 'Hydrotest',
  'ready-to-ship': 'Ready to ship',
  shipped: 'Shipped',
  'on-hold': 'On hold',
  cancelled: 'Cancelled',
};

const text = (max: number) => z.string().trim().min(1, { error: 'Required.' }).max(max);

export const acceptQuoteSchema = z.object({
  poNumber: text(60),
  billingContact: z.object({
    name: text(120),
    email: z.string().trim().toLowerCase().pipe(z.email({ error: 'Enter a valid e-mail address.' })),
    phone: z.string().trim().max(40).optional(),
  }),
  deliveryAddress: z.object({
    line1: text(200),
    line2: z.string().trim().max(200).optional(),
    city: text(100),
    postalCode: text(20),
    country: text(80),
  }),
});
export type AcceptQuoteInput = z.input<typeof acceptQuoteSchema>;

export const acceptResultSchema = z.object({
  orderDraftId: z.uuid().optional(),
  paymentIntentId: z.string(),
  clientSecret: z.string(),
  amount_minor: z.int(),
  currency: z.string(),
  paymentUrl: z.string(),
});
export type AcceptResult = z.infer<typeof acceptResultSchema>;

export const advanceOrderSchema = z.object({
  to: orderStatusSchema,
  note: z.string().trim().max(2000).optional(),
  /** the test pressure applied, Pa gauge: required when leaving the hydrotest step */
  hydrotestPressure_Pa: z.number().positive().max(1e9).optional(),
  hydrotestPassed: z.boolean().optional(),
});

export const cancelOrderSchema = z.object({
  reason: text(2000),
  /** the status the canceller saw: when the order has moved on since (a release), the cancel is refused with 409 */
  from: orderStatusSchema.optional(),
});

export const listOrdersQuerySchema = z.object({
  status: orderStatusSchema.optional(),
  q: z.string().trim().max(100).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
  sort: z.enum(['created', '-created', 'needBy', '-needBy', 'number', '-number', 'updated', '-updated']).default('-updated'),
});
export type ListOrdersQuery = z.infer<typeof listOrdersQuerySchema>;

export const orderEventSchema = z.object({
  status: orderStatusSchema,
  note: z.string().nullable(),
  by: z.string().nullable(),
  at: z.string(),
});

export const orderSchema = z.object({
  id: z.uuid(),
  number: z.string(),
  quoteId: z.uuid(),
  quoteNumber: z.string(),
  /** the offer revision that was accepted and paid for */
  revisionNumber: z.int(),
  organizationId: z.uuid(),
  organizationName: z.string(),
  status: orderStatusSchema,
  poNumber: z.string(),
  needBy: z.string().nullable(),
  total_minor: z.int(),
  deposit_minor: z.int(),
  refunded_minor: z.int(),
  currency: z.string(),
  design: designSchema,
  quantity: z.int(),
  timeline: z.array(orderEventSchema),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Order = z.infer<typeof orderSchema>;
