/** Words and tag colours for quote statuses, shared by the queue and the workspace. */
import type { QuoteStatus } from '@shared/schemas/quotes';
import { QUOTE_STATUS_LABEL } from '@shared/status-words';

/** Staff words for quote statuses (shared with the CSV export). */
export const STATUS_LABELS: Record<QuoteStatus, string> = QUOTE_STATUS_LABEL;

export const STATUS_TAG: Record<QuoteStatus, 'default' | 'info' | 'success' | 'warning' | 'error'> = {
  'in-review': 'info',
  questions: 'warning',
  approved: 'success',
  declined: 'error',
  accepted: 'success',
  ordered: 'default',
};
