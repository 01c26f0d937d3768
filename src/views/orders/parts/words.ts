/** Our words for order states on the customer's pages: the tag colour and what the step means to a buyer. */
import type { OrderStatus } from '@shared/schemas/orders';

type TagType = 'default' | 'info' | 'success' | 'warning' | 'error';

export const ORDER_WORDS: Record<OrderStatus, { type: TagType; hint: string }> = {
  'deposit-paid': { type: 'info', hint: 'Your deposit is in; the sales engineer hands the order to the shop next.' },
  released: { type: 'info', hint: 'The shop has the order and its build sheet.' },
  cutting: { type: 'info', hint: 'Tubes, tubesheets and baffles are being cut.' },
  tubing: { type: 'info', hint: 'The bundle is being tubed; the tubes are expanded and welded into the tubesheets.' },
  'shell-and-heads': { type: 'info', hint: 'The bundle goes into its shell and the heads are fitted.' },
  hydrotest: { type: 'info', hint: 'The cooler is pressure-tested with water.' },
  'ready-to-ship': { type: 'success', hint: 'Built and tested; waiting for dispatch.' },
  shipped: { type: 'success', hint: 'On its way to your delivery address.' },
  'on-hold': { type: 'warning', hint: 'Work is paused; the sales engineer will be in touch.' },
  cancelled: { type: 'error', hint: 'This order was cancelled.' },
};
