/**
 * One quote in the sales workspace: loading it, and every change sent with the quote's `version`.
 * A 409 `stale-version` (someone saved first) raises `stale` instead of an error, and nothing the
 * engineer typed is cleared: the parts keep their drafts until a save succeeds.
 */
import { ref } from 'vue';
import type { QuoteDetail } from '@shared/schemas/quotes';
import { errorMessage, isApiError } from '../api/http';
import { fetchQuote } from '../api/quotes';

export function useReviewQuote(id: () => string) {
  const quote = ref<QuoteDetail | null>(null);
  const loading = ref(false);
  const loadError = ref<string | null>(null);
  /** someone else changed the quote since it was loaded */
  const stale = ref(false);
  /** which action is running, for its button's spinner */
  const busy = ref<string | null>(null);
  /** bumps after each successful save, so parts can take the saved state as their new baseline */
  const saves = ref(0);

  async function load(): Promise<void> {
    loading.value = true;
    loadError.value = null;
    try {
      quote.value = await fetchQuote(id());
      stale.value = false;
    } catch (error) {
      loadError.value = errorMessage(error);
    } finally {
      loading.value = false;
    }
  }

  /**
   * Runs a change with the current version. Resolves to null on success, else to the message to show
   * beside the action (the stale case shows the page-wide reload banner instead).
   */
  async function change(action: string, send: (id: string, version: number) => Promise<QuoteDetail>): Promise<string | null> {
    const current = quote.value;
    if (!current) return 'The quote is not loaded.';
    busy.value = action;
    try {
      quote.value = await send(current.id, current.version);
      saves.value++;
      return null;
    } catch (error) {
      if (isApiError(error) && error.status === 409 && error.code === 'stale-version') {
        stale.value = true;
        return 'Not saved: someone else changed this quote first.';
      }
      return errorMessage(error);
    } finally {
      busy.value = null;
    }
  }

  return { quote, loading, loadError, stale, busy, saves, load, change };
}

export type ReviewQuote = ReturnType<typeof useReviewQuote>;
