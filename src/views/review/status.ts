/** Words and tag colours for quote statuses, shared by the queue and the workspace. */
import type { QuoteStatus } from '@shared/schemas/quotes';

export const STATUS_LABELS: Record<QuoteStatus, string> = {
  'in-review': 'In review',
  questions: 'Questions sent',
  approved: 'Approved',
  declined: 'Declined',
  accepted: 'Accepted',
  ordered: 'Ordered',
};

export const STATUS_TAG: Record<QuoteStatus, 'default' | 'info' | 'success' | 'warning' | 'error'> = {
  'in-review': 'info',
  questions: 'warning',
  approved: 'success',
  declined: 'error',
  accepted: 'success',
  ordered: 'default',
};
