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

/** Money and dates as on every page, PDF and e-mail (shared/format.ts). */
export { formatDate, formatMoney } from '@shared/format';
