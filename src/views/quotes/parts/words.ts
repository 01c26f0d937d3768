/** Our words for quote states, conversation entries, money and dates on the customer's pages. */
import type { QuoteDetail, QuoteStatus } from '@shared/schemas/quotes';

type TagType = 'default' | 'info' | 'success' | 'warning' | 'error';

export const STATUS_WORDS: Record<QuoteStatus, { label: string; type: TagType; hint: string }> = {
  'in-review': { label: 'In engineering review', type: 'info', hint: 'Our engineers are checking the design and price.' },
  questions: { label: 'Questions for you', type: 'warning', hint: 'The sales engineer needs an answer before the offer can be made.' },
  approved: { label: 'Offer approved', type: 'success', hint: 'The offer is final and can be downloaded.' },
  declined: { label: 'Declined', type: 'error', hint: 'The fabricator cannot make an offer for this request.' },
  accepted: { label: 'Accepted', type: 'success', hint: 'You accepted the offer.' },
  ordered: { label: 'Ordered', type: 'success', hint: 'The order is with the shop.' },
};

export const EVENT_WORDS: Record<string, string> = {
  submitted: 'Request sent',
  questions: 'Question from the sales engineer',
  'change-requested': 'Change requested',
  approved: 'Offer approved',
  declined: 'Declined',
  attachment: 'File attached',
  accepted: 'Offer accepted',
  ordered: 'Deposit paid, order placed',
};

export const REVISION_WORDS: Record<QuoteDetail['revision']['kind'], string> = {
  budget: 'Budget offer',
  draft: 'Draft',
  offer: 'Offer',
};

const moneyFormats = new Map<string, Intl.NumberFormat>();

/** Integer minor units in the currency's own decimals: 1738884 USD → "US$17,388.84". */
export function formatMoney(minor: number, currency: string): string {
  let format = moneyFormats.get(currency);
  if (!format) {
    format = new Intl.NumberFormat('en-GB', { style: 'currency', currency });
    moneyFormats.set(currency, format);
  }
  const decimals = format.resolvedOptions().minimumFractionDigits ?? 2;
  return format.format(minor / 10 ** decimals);
}

const dateOnly = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium' });

/** "4 Dec 2026"; a bare `2027-03-31` is read as that calendar day, not shifted by the time zone. */
export function formatDate(value: string | null | undefined): string {
  if (!value) return '—';
  const date = /^\d{4}-\d{2}-\d{2}$/.test(value) ? new Date(`${value}T12:00:00`) : new Date(value);
  return Number.isNaN(date.getTime()) ? value : dateOnly.format(date);
}
