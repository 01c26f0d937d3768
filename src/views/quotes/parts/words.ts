/** Our words for quote states, conversation entries, money and dates on the customer's pages. */
import type { QuoteDetail, QuoteStatus } from '@shared/schemas/quotes';
import { QUOTE_STATUS_CUSTOMER_LABEL } from '@shared/status-words';

type TagType = 'default' | 'info' | 'success' | 'warning' | 'error';

export const STATUS_WORDS: Record<QuoteStatus, { label: string; type: TagType; hint: string }> = {
  'in-review': { label: QUOTE_STATUS_CUSTOMER_LABEL['in-review'], type: 'info', hint: 'Our engineers are checking the design and price.' },
  questions: { label: QUOTE_STATUS_CUSTOMER_LABEL['questions'], type: 'warning', hint: 'The sales engineer needs an answer before the offer can be made.' },
  approved: { label: QUOTE_STATUS_CUSTOMER_LABEL['approved'], type: 'success', hint: 'The offer is final and can be downloaded.' },
  declined: { label: QUOTE_STATUS_CUSTOMER_LABEL['declined'], type: 'error', hint: 'The fabricator cannot make an offer for this request.' },
  accepted: { label: QUOTE_STATUS_CUSTOMER_LABEL['accepted'], type: 'success', hint: 'You accepted the offer.' },
  ordered: { label: QUOTE_STATUS_CUSTOMER_LABEL['ordered'], type: 'success', hint: 'The order is with the shop.' },
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
