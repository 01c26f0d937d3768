/** Words for quote statuses, one set for staff pages and one for the customer's, shared by the pages and the CSV exports. */
import type { QuoteStatus } from './schemas/quotes';

/** What staff read (review queue, workspace, staff exports). */
export const QUOTE_STATUS_LABEL: Record<QuoteStatus, string> = {
  'in-review': 'In review',
  questions: 'Questions sent',
  approved: 'Approved',
  declined: 'Declined',
  accepted: 'Accepted',
  ordered: 'Ordered',
};

/** What the customer reads (their quote pages and exports). */
export const QUOTE_STATUS_CUSTOMER_LABEL: Record<QuoteStatus, string> = {
  'in-review': 'In engineering review',
  questions: 'Questions for you',
  approved: 'Offer approved',
  declined: 'Declined',
  accepted: 'Accepted',
  ordered: 'Ordered',
};
