/**
 * Orders: an accepted offer whose deposit is paid, built by the shop step by step.
 * The steps in order; `on-hold` and `cancelled` can interrupt them.
 */
import { z } from 'zod';
import { orderEventKindSchema } from './events';
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

/** Steps the customer hears of by e-mail (the others show on their timeline only): the shop confirms before moving an order to one. */
export const CUSTOMER_EMAIL_STEPS: readonly OrderStatus[] = ['released', 'hydrotest', 'ready-to-ship', 'shipped', 'on-hold', 'cancelled'];

/**
 * What the customer reads when their order is put on hold: neutral wordings chosen separately from
 * the reason, which stays with staff.
 */
export const HOLD_WORDINGS = {
  'awaiting-material': 'Waiting for material to arrive; we will tell you when work resumes.',
  'awaiting-information': 'Waiting for information from you; your sales engineer will be in touch.',
  'quality-check': 'Held for an additional quality check.',
  rescheduled: 'Rescheduled in the shop; we will confirm the new date.',
} as const;
export const holdWordingSchema = z.enum(Object.keys(HOLD_WORDINGS) as [keyof typeof HOLD_WORDINGS, ...(keyof typeof HOLD_WORDINGS)[]], {
  error: 'Choose what the customer reads.',
});
export type HoldWording = z.infer<typeof holdWordingSchema>;

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

/**
 * A move of the shop. `note` is for staff only; `customerNote` is written for the customer (their
 * timeline and the step's e-mail: a waybill). Putting an order on hold needs `reason` (staff) and
 * `customerWording` (what the customer reads). Leaving the hydrotest needs both sides recorded passed.
 */
export const advanceOrderSchema = z.object({
  to: orderStatusSchema,
  note: z.string().trim().max(2000).optional(),
  customerNote: z.string().trim().max(500).optional(),
  reason: z.string().trim().max(2000).optional(),
  customerWording: holdWordingSchema.optional(),
});
export type AdvanceOrderInput = z.input<typeof advanceOrderSchema>;

export const hydrotestSides = ['tube', 'shell'] as const;
export type HydrotestSideName = (typeof hydrotestSides)[number];

const hydrotestSideSchema = z.object({
  /** the test pressure held, Pa gauge */
  pressure_Pa: z.number({ error: 'Enter the test pressure.' }).positive({ error: 'Enter the test pressure.' }).max(1e9),
  /** how long the pressure was held, minutes */
  holdTime_min: z.number({ error: 'Enter the hold time.' }).positive({ error: 'Enter the hold time.' }).max(24 * 60),
  passed: z.boolean({ error: 'Choose passed or failed.' }),
});

/** The hydrotest of one or both sides, recorded while the order is at the hydrotest step. */
export const recordHydrotestSchema = z
  .object({ tube: hydrotestSideSchema.optional(), shell: hydrotestSideSchema.optional(), note: z.string().trim().max(2000).optional() })
  .refine((v) => v.tube || v.shell, { error: 'Record the tube side, the shell side or both.', path: ['tube'] });
export type RecordHydrotestInput = z.input<typeof recordHydrotestSchema>;

/** One side's latest test and the pressure the build sheet asks for (staff). */
export const hydrotestStateSchema = z.object({
  sides: z.array(z.object({
    side: z.enum(hydrotestSides),
    required_Pa: z.number(),
    latest: z.object({ pressure_Pa: z.number(), holdTime_min: z.number(), passed: z.boolean(), by: z.string().nullable(), at: z.string() }).nullable(),
  })),
  /** both sides' latest tests passed: the order may leave the hydrotest */
  passed: z.boolean(),
});
export type HydrotestState = z.infer<typeof hydrotestStateSchema>;

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
  kind: orderEventKindSchema,
  status: orderStatusSchema,
  note: z.string().nullable(),
  /** staff only: the hydrotest's hold time and required pressure */
  detail: z.string().optional(),
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
  /** the step an order on hold left (and resumes at) */
  heldFrom: orderStatusSchema.nullable(),
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
