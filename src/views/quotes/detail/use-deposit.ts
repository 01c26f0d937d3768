/**
 * Accepting an offer and paying its deposit, as the buyer's browser sees it. Accepting sends the
 * browser to the card processor's payment page; coming back (`?payment=returned`) proves nothing, so
 * the page asks the server every second until the verified webhook has made the order, or recorded a
 * failure. The details typed when accepting are kept for this tab, so "Pay again" needs no retyping.
 */
import { onBeforeUnmount, ref, type Ref } from 'vue';
import type { AcceptQuoteInput, AcceptResult } from '@shared/schemas/orders';
import type { QuoteDetail } from '@shared/schemas/quotes';
import { acceptQuote } from '../../../api/orders';
import { errorMessage } from '../../../api/http';
import { fetchQuote } from '../../../api/quotes';

/** `confirming`: back from paying, waiting for the server; `slow`: it has not answered within the wait. */
export type ReturnPhase = 'none' | 'confirming' | 'slow';

const POLL_MS = 1000;
const POLL_TRIES = 30;
const storageKey = (quoteId: string) => `bundlesmith.acceptance.${quoteId}`;

function remembered(quoteId: string): AcceptQuoteInput | null {
  try {
    const text = sessionStorage.getItem(storageKey(quoteId));
    return text ? (JSON.parse(text) as AcceptQuoteInput) : null;
  } catch {
    return null;
  }
}

export function useDeposit(quote: Ref<QuoteDetail | null>) {
  const phase = ref<ReturnPhase>('none');
  const result = ref<AcceptResult | null>(null);
  const paying = ref(false);
  const failure = ref<string | null>(null);
  let timer: ReturnType<typeof setTimeout> | undefined;
  let stopped = false;

  /** Accepts (or, once accepted, re-opens the same payment) and leaves for the payment page. Throws on refusal. */
  async function accept(input: AcceptQuoteInput): Promise<void> {
    if (!quote.value) return;
    const id = quote.value.id;
    const answer = await acceptQuote(id, input);
    try {
      sessionStorage.setItem(storageKey(id), JSON.stringify(input));
    } catch {
      // private mode without storage: "Pay again" will ask for the details again
    }
    result.value = answer;
    window.location.assign(answer.paymentUrl);
  }

  /** The retry after a declined card; false when this tab no longer has the details (the form is shown). */
  async function payAgain(): Promise<boolean> {
    if (!quote.value) return true;
    const input = remembered(quote.value.id);
    if (!input) return false;
    paying.value = true;
    failure.value = null;
    try {
      await accept(input);
    } catch (error) {
      failure.value = errorMessage(error);
      paying.value = false;
    }
    return true;
  }

  /**
   * Polls the quote after the payment page sent the buyer back. A "succeeded" redirect waits for the
   * order only (an earlier decline may still be on record until the webhook lands).
   */
  function confirmReturn(quoteId: string, redirectStatus: string | undefined): void {
    clearTimeout(timer);
    phase.value = 'confirming';
    let tries = 0;
    const tick = async (): Promise<void> => {
      if (stopped) return;
      tries += 1;
      try {
        const fresh = await fetchQuote(quoteId);
        if (stopped) return;
        quote.value = fresh;
        const failed = redirectStatus !== 'succeeded' && fresh.payment?.status === 'payment-failed';
        if (fresh.orderId || failed) {
          phase.value = 'none';
          return;
        }
      } catch {
        // a dropped request: the next tick tries again
      }
      if (tries >= POLL_TRIES) phase.value = 'slow';
      else timer = setTimeout(() => void tick(), POLL_MS);
    };
    void tick();
  }

  onBeforeUnmount(() => {
    stopped = true;
    clearTimeout(timer);
  });

  return { phase, result, paying, failure, accept, payAgain, confirmReturn };
}

export type Deposit = ReturnType<typeof useDeposit>;
