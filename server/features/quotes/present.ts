/** Rows → the response shapes of shared/schemas/quotes.ts, with what each role may see. */
import type { SessionUser } from '../../../shared/schemas/auth';
import type { PriceLine } from '../../../shared/schemas/price-book';
import { tubeMaterial } from '../../../shared/thermal/geometry/materials';
import { tubeSizeOf } from '../../../shared/thermal/geometry/tubes';
import type { QuoteDetail, QuoteSummary, Revision } from '../../../shared/schemas/quotes';
import type { SizeRequest } from '../../../shared/schemas/thermal';
import { processSideOf, shellsOf } from '../pricing/design-fields';
import { isStaff } from '../../lib/auth/guards';
import type * as repo from './repository';

/** Hours the fabricator promises for a first engineering response (shown against each quote's age). */
export const RESPONSE_TARGET_HOURS = 48;
/** ± spread of a budget offer before engineering review (a commercial choice of the demo fabricator). */
export const BUDGET_SPREAD = 0.1;

type Row = NonNullable<Awaited<ReturnType<typeof repo.findQuote>>>;
const iso = (d: Date | string | null) => (d === null ? null : new Date(d).toISOString());

/**
 * Staff see the quote as it stands; a customer sees the total, quantity and design of the last
 * revision meant for them, not those of a draft a sales engineer has not sent yet.
 */
export function toSummary(viewer: SessionUser, row: Row): QuoteSummary {
  const staff = isStaff(viewer);
  const created = new Date(row.createdAt);
  const expired = row.status === 'approved' && row.validUntil !== null && new Date(row.validUntil) < new Date();
  return {
    id: row.id,
    number: row.number,
    status: row.status,
    version: row.version,
    organizationId: row.organizationId,
    organizationName: row.organizationName,
    reference: row.reference,
    quantity: staff ? row.quantity : row.customerQuantity,
    needBy: row.needBy,
    validUntil: iso(row.validUntil),
    expired,
    priceTotal_minor: staff ? row.priceTotal_minor : row.customerTotal_minor,
    currency: row.currency,
    submittedBy: { id: row.submittedById, name: row.submittedByName },
    assignee: row.assigneeId ? { id: row.assigneeId, name: row.assigneeName! } : null,
    createdAt: created.toISOString(),
    updatedAt: new Date(row.updatedAt).toISOString(),
    responseDueAt: new Date(created.getTime() + RESPONSE_TARGET_HOURS * 3_600_000).toISOString(),
    designSummary: staff ? row.designSummary : row.customerDesignSummary,
  };
}

/**
 * Customers see the price as the fabricator chooses to show it: the cooler per unit, then any
 * discount or surcharge and the lines sales added (freight, crating, inspection). Cost build-up, overhead, margin and override reasons stay internal.
 */
export function customerPrice(price: Revision['price']): Revision['price'] {
  const shown = (l: PriceLine) => l.group === 'discount' || l.group === 'surcharge' || l.group === 'extra';
  const hidden = price.lines.filter((l) => !shown(l));
  const perUnit = hidden.reduce((s, l) => s + l.amount_minor, 0);
  const unitLine: PriceLine = {
    key: 'cooler',
    group: 'material',
    description: 'Cooler as specified (material, fabrication, testing)',
    quantity: price.quantity,
    unit: 'unit',
    rate_minor: perUnit,
    amount_minor: perUnit * price.quantity,
    source: `price book v${price.priceBookVersion}`,
  };
  // added lines (freight, crating, inspection) are shown by their label; why they were added stays internal
  const visible = price.lines.filter(shown).map(({ override: _o, added: _a, ...l }) => l);
  return { ...price, lines: [unitLine, ...visible] };
}

export function toDetail(
  viewer: SessionUser,
  row: Row,
  revision: Revision,
  parts: {
    revisions: Awaited<ReturnType<typeof repo.listRevisions>>;
    attachments: Awaited<ReturnType<typeof repo.listAttachments>>;
    events: Awaited<ReturnType<typeof repo.listEvents>>;
    payment: Awaited<ReturnType<typeof repo.paymentState>>['payment'];
    orderId: string | null;
  },
): QuoteDetail {
  const staff = isStaff(viewer);
  const summary = toSummary(viewer, row);
  const sales = viewer.role === 'sales' || viewer.role === 'admin';
  const open = row.status === 'in-review' || row.status === 'questions';
  const shown = staff ? revision : { ...revision, price: customerPrice(revision.price) };
  return {
    ...summary,
    notes: row.notes,
    revision: shown,
    revisions: parts.revisions
      .filter((r) => staff || r.kind !== 'draft')
      .map((r) => ({ ...r, createdAt: new Date(r.createdAt).toISOString() })),
    budgetRange:
      row.status === 'in-review' && revision.kind !== 'offer'
        ? {
            low_minor: Math.round(summary.priceTotal_minor * (1 - BUDGET_SPREAD)),
            high_minor: Math.round(summary.priceTotal_minor * (1 + BUDGET_SPREAD)),
          }
        : null,
    attachments: parts.attachments.map(({ storageKey: _k, ...a }) => ({ ...a, createdAt: new Date(a.createdAt).toISOString() })),
    events: parts.events.map((e) => ({
      id: e.id,
      kind: e.kind,
      message: e.message,
      internal: e.internal,
      actor: e.actorName ? { name: e.actorName, role: e.actorRole! } : null,
      createdAt: new Date(e.createdAt).toISOString(),
    })),
    payment: parts.payment,
    orderId: parts.orderId,
    can: {
      edit: sales && open,
      approve: sales && open,
      decline: sales && (open || row.status === 'approved'),
      requestChange: viewer.role === 'customer' && ['in-review', 'questions', 'approved'].includes(row.status),
      accept: viewer.role === 'customer' && row.status === 'approved' && !summary.expired,
      // accepted but the deposit not (yet) paid: pay again with the same PaymentIntent
      pay: viewer.role === 'customer' && row.status === 'accepted' && parts.payment?.status !== 'paid',
    },
  };
}

/** A short name of the process fluid for one line: "oil", "glycol", "water", "air". */
function fluidWord(duty?: Pick<SizeRequest, 'process'>): string {
  const f = duty?.process.fluid;
  if (typeof f !== 'string') return 'process fluid';
  if (f.startsWith('oil')) return 'oil';
  if (f.includes('glycol')) return 'glycol';
  if (f.startsWith('air')) return 'air';
  return f === 'water' ? 'water' : 'process fluid';
}

/**
 * `212 × 3/4 in BWG 16 Copper (C12200), 2.40 m, 2 passes, NPS 12 STD`: the catalogue's own labels;
 * then `, 2 shells in series` when there are several (tube count and length are per shell) and
 * `, oil on the shell side` when the process is not in the tubes. Old stored designs read as one
 * shell with the process in the tubes, so their summary is unchanged.
 */
export function designSummary(d: Revision['design'], duty?: Pick<SizeRequest, 'process'>): string {
  const od = tubeSizeOf(d.tubeOuterDiameter_m)?.label ?? `${(d.tubeOuterDiameter_m * 1000).toFixed(1)} mm`;
  const material = tubeMaterial(d.tubeMaterial)?.name ?? d.tubeMaterial;
  const passes = `${d.tubePasses} pass${d.tubePasses > 1 ? 'es' : ''}`;
  const n = shellsOf(d);
  const shells = n > 1 ? `, ${n} shells in series` : '';
  const side = processSideOf(d) === 'shell' ? `, ${fluidWord(duty)} on the shell side` : '';
  return `${d.tubeCount} × ${od} ${d.tubeWallLabel} ${material}, ${d.tubeLength_m.toFixed(2)} m, ${passes}${d.shellLabel ? `, ${d.shellLabel}` : ''}${shells}${side}`;
}
