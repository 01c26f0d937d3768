/**
 * Quotes: a customer's duty, sized and priced at once, reviewed by a sales engineer, sent as an offer.
 * Every change makes a new immutable revision that keeps the inputs, the design, the rating, the
 * price lines and the price-book version, so any offer can be reproduced.
 */
import { z } from 'zod';
import { designSchema, layoutSchema, processSideSchema, SHELLS_IN_SERIES_MAX, sizeRequestSchema } from './thermal';
import { priceSchema } from './price-book';
import { tubeMaterialIds } from '../thermal/geometry/materials';
import { plainText } from './text';

/**
 * in-review: awaiting engineering review (a budget offer is shown) · questions: sent back to the
 * customer · approved: offer sent · declined · accepted: buyer accepted, deposit unpaid · ordered.
 */
export const quoteStatuses = ['in-review', 'questions', 'approved', 'declined', 'accepted', 'ordered'] as const;
export const quoteStatusSchema = z.enum(quoteStatuses);
export type QuoteStatus = z.infer<typeof quoteStatusSchema>;

const isoDate = z.iso.date({ error: 'Use a date like 2027-03-31.' });

/** Geometry a sales engineer sets by hand; it is rated as given (not re-sized). */
export const designEditSchema = z.object({
  tubeCount: z.int().min(1).max(20000),
  tubeLength_m: z.number().positive().max(12),
  tubeOuterDiameter_m: z.number().positive().max(0.1),
  tubeWall_m: z.number().positive().max(0.01),
  tubeMaterial: z.enum(tubeMaterialIds),
  tubePasses: z.int().min(1).max(8),
  layout: layoutSchema,
  shellInnerDiameter_m: z.number().positive().max(3),
  baffleSpacing_m: z.number().positive().max(5).optional(),
  /** where the process stream goes (default: in the tubes); a wall-cooled duty keeps it in the tubes */
  processSide: processSideSchema.optional(),
  /** identical shells in series (default 1); tubeCount and tubeLength_m are per shell */
  shellsInSeries: z.int().min(1).max(SHELLS_IN_SERIES_MAX).optional(),
  /** baffle cut, a fraction of the shell inner diameter (default 0.25) */
  baffleCut: z.number().min(0.15).max(0.45).optional(),
});
export type DesignEdit = z.infer<typeof designEditSchema>;

/**
 * The design a customer picked on the sizing page (issue 12): its geometry, as a sales engineer would
 * set it (shell and layout absent for a wall-cooled bundle). The server sizes the duty and keeps this
 * design when it is among the sized ones or, rated as given, still meets the duty, the limits, the
 * design margin and the shop's rules; otherwise it answers why it stored another.
 */
export const chosenDesignSchema = designEditSchema.extend({
  layout: layoutSchema.optional(),
  shellInnerDiameter_m: z.number().positive().max(3).optional(),
});
export type ChosenDesign = z.infer<typeof chosenDesignSchema>;

/** What became of a chosen design: kept, or why another was stored (the create answer's `designChoice`). */
export const designChoiceSchema = z.object({ kept: z.boolean(), note: z.string().optional() });
export type DesignChoice = z.infer<typeof designChoiceSchema>;

export const createQuoteSchema = z.object({
  duty: sizeRequestSchema,
  quantity: z.int({ error: 'Enter a whole number of units.' }).min(1).max(500),
  needBy: isoDate.optional(),
  notes: plainText().trim().max(4000).optional(),
  /** the customer's own tag, e.g. the compressor package it serves */
  reference: plainText().trim().max(120).optional(),
  /** the design picked on the sizing page ("Request this design"); absent: the server's recommendation */
  chosenDesign: chosenDesignSchema.optional(),
});
export type CreateQuoteInput = z.input<typeof createQuoteSchema>;

/**
 * The most a price override may be, in minor units (100 million in the currency): a quote of 500
 * units of ~50 lines then stays near 10^14, far inside the safe-integer range. The server also keeps
 * each override within ±90 % of its computed line (server/features/pricing/price.ts).
 */
export const OVERRIDE_CAP_MINOR = 10_000_000_000;

export const priceOverrideSchema = z.object({
  key: plainText().min(1),
  amount_minor: z
    .int()
    .min(-OVERRIDE_CAP_MINOR, { error: `At most ${OVERRIDE_CAP_MINOR} minor units either way.` })
    .max(OVERRIDE_CAP_MINOR, { error: `At most ${OVERRIDE_CAP_MINOR} minor units either way.` }),
  reason: plainText().trim().min(3, { error: 'Say why the computed price is overridden.' }).max(500),
});

/** Lines a sales engineer adds to an order beyond the cooler itself (priced once per order, not per unit). */
export const freeLineKinds = ['freight', 'crating', 'inspection', 'other'] as const;
export const FREE_LINE_LABEL: Record<(typeof freeLineKinds)[number], string> = {
  freight: 'Freight',
  crating: 'Crating',
  inspection: 'Third-party inspection',
  other: 'Other',
};
/** The most one added line may be, in minor units (1 million in the currency; ours). */
export const FREE_LINE_MAX_MINOR = 100_000_000;

export const freeLineSchema = z
  .object({
    kind: z.enum(freeLineKinds, { error: 'Choose freight, crating, inspection or other.' }),
    /** what the customer reads after the kind, e.g. "DAP Rotterdam, two pallets"; required for `other` */
    description: plainText().trim().max(120).optional(),
    amount_minor: z
      .int({ error: 'Enter an amount in cents.' })
      .min(1, { error: 'The amount must be more than 0.' })
      .max(FREE_LINE_MAX_MINOR, { error: `At most ${FREE_LINE_MAX_MINOR / 100} in the quote's currency.` }),
    /** internal: why the line is there (a carrier's quote, the customer's request) */
    reason: plainText().trim().min(3, { error: 'Say why the line is added.' }).max(500),
  })
  .refine((l) => l.kind !== 'other' || (l.description ?? '').length > 0, { error: 'Describe an "other" line for the customer.', path: ['description'] });
export type FreeLine = z.infer<typeof freeLineSchema>;

/** What a sales engineer may change; the same shape previews a change without saving it. */
export const quoteChangeSchema = z.object({
  duty: sizeRequestSchema.optional(),
  design: designEditSchema.optional(),
  priceOverrides: z.array(priceOverrideSchema).max(50).optional(),
  /** the added lines; a list given replaces the old one, otherwise the old lines carry over */
  freeLines: z.array(freeLineSchema).max(10, { error: 'At most 10 added lines.' }).optional(),
  quantity: z.int().min(1).max(500).optional(),
});
const notBoth = (p: { duty?: unknown; design?: unknown }) => !(p.duty && p.design);
const notBothMessage = { error: 'Change the duty or the design, not both at once.', path: ['design'] };
export const previewChangeSchema = quoteChangeSchema.refine(notBoth, notBothMessage);

export const patchQuoteSchema = quoteChangeSchema
  .extend({
    version: z.int().min(1),
    internalNote: plainText().trim().min(1).max(4000).optional(),
  })
  .refine(notBoth, notBothMessage);
export type PatchQuoteInput = z.input<typeof patchQuoteSchema>;

export const approveQuoteSchema = z.object({ version: z.int().min(1), message: plainText().trim().max(4000).optional() });
export const reasonSchema = z.object({
  version: z.int().min(1).optional(),
  message: plainText().trim().min(3, { error: 'Write a few words.' }).max(4000),
});

export const listQuotesQuerySchema = z.object({
  status: quoteStatusSchema.optional(),
  q: plainText().trim().max(100).optional(),
  assignee: z.union([z.literal('me'), z.literal('none'), z.uuid()]).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
  sort: z
    .enum(['created', '-created', 'updated', '-updated', 'value', '-value', 'needBy', '-needBy', 'number', '-number'])
    .default('-updated'),
});
export type ListQuotesQuery = z.infer<typeof listQuotesQuerySchema>;

/** What one revision froze. */
export const revisionSchema = z.object({
  number: z.int(),
  kind: z.enum(['budget', 'draft', 'offer']),
  createdAt: z.string(),
  createdBy: z.string(),
  duty: sizeRequestSchema,
  design: designSchema,
  alternatives: z.array(designSchema.omit({ rating: true })),
  price: priceSchema,
  leadTimeWeeks: z.int(),
  /** set on an offer: until when it may be accepted */
  validUntil: z.string().optional(),
  /** set on an offer: the sales engineer's message at approval, printed on the offer and in its e-mail */
  message: z.string().optional(),
});
export type Revision = z.infer<typeof revisionSchema>;

// ---- responses ----

const person = z.object({ id: z.uuid(), name: z.string() });

export const quoteSummarySchema = z.object({
  id: z.uuid(),
  /** shown to people: `Q-2026-0042` */
  number: z.string(),
  status: quoteStatusSchema,
  /** optimistic-lock version: send it back with every change; a stale one gets 409 */
  version: z.int(),
  organizationId: z.uuid(),
  organizationName: z.string(),
  reference: z.string().nullable(),
  quantity: z.int(),
  needBy: z.string().nullable(),
  validUntil: z.string().nullable(),
  /** true when an approved offer is past its validity date */
  expired: z.boolean(),
  priceTotal_minor: z.int(),
  currency: z.string(),
  submittedBy: person,
  assignee: person.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  /** when the fabricator promised a response (created + response target) */
  responseDueAt: z.string(),
  /** one-line summary of the design: `212 × 3/4 in BWG 16 copper, 2.4 m, 2 passes` */
  designSummary: z.string(),
});
export type QuoteSummary = z.infer<typeof quoteSummarySchema>;

export const attachmentSchema = z.object({
  id: z.uuid(),
  filename: z.string(),
  contentType: z.string(),
  size: z.int(),
  sha256: z.string(),
  uploadedBy: z.string(),
  createdAt: z.string(),
});
export type Attachment = z.infer<typeof attachmentSchema>;

export const quoteEventSchema = z.object({
  id: z.uuid(),
  kind: z.string(),
  message: z.string().nullable(),
  /** internal notes and audit entries are shown to staff only */
  internal: z.boolean(),
  actor: z.object({ name: z.string(), role: z.string() }).nullable(),
  createdAt: z.string(),
});

export const quoteDetailSchema = quoteSummarySchema.extend({
  notes: z.string().nullable(),
  revision: revisionSchema,
  revisions: z.array(z.object({ number: z.int(), kind: z.enum(['budget', 'draft', 'offer']), createdAt: z.string(), createdBy: z.string(), total_minor: z.int() })),
  /** for a budget offer (in review): the range the final price is expected in */
  budgetRange: z.object({ low_minor: z.int(), high_minor: z.int() }).nullable(),
  attachments: z.array(attachmentSchema),
  events: z.array(quoteEventSchema),
  /** the buyer's deposit payment once the offer is accepted (latest acceptance), else null */
  payment: z
    .object({ status: z.enum(['awaiting-payment', 'payment-failed', 'paid', 'canceled']), lastError: z.string().nullable(), amount_minor: z.int(), currency: z.string() })
    .nullable(),
  /** the order made from this quote once its deposit is paid */
  orderId: z.uuid().nullable(),
  /** what the signed-in user may do now */
  can: z.object({ edit: z.boolean(), approve: z.boolean(), decline: z.boolean(), requestChange: z.boolean(), accept: z.boolean(), pay: z.boolean() }),
});
export type QuoteDetail = z.infer<typeof quoteDetailSchema>;

export const quoteListSchema = z.object({
  items: z.array(quoteSummarySchema),
  total: z.int(),
  page: z.int(),
  pageSize: z.int(),
});
