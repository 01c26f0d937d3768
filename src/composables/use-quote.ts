/**
 * One quote as its customer sees it: loaded by id (and revision, when an older offer is opened), with
 * "request a change" and more attachments. Another organisation's quote answers 404, which the page
 * shows as "not found" and nothing else.
 */
import { ref } from 'vue';
import type { QuoteDetail } from '@shared/schemas/quotes';
import { errorMessage, isApiError } from '../api/http';
import { fetchQuote, requestQuoteChange } from '../api/quotes';
import { useQuoteUploads } from './use-quote-uploads';

export function useQuote() {
  const quote = ref<QuoteDetail | null>(null);
  const loading = ref(false);
  const notFound = ref(false);
  const failure = ref<string | null>(null);
  const uploads = useQuoteUploads();
  let latest = 0;
  let shown: [string, number | undefined] = ['', undefined];

  async function load(id: string, revision?: number): Promise<void> {
    const mine = ++latest;
    shown = [id, revision];
    loading.value = true;
    failure.value = null;
    try {
      const answer = await fetchQuote(id, revision);
      if (mine !== latest) return;
      quote.value = answer;
      notFound.value = false;
    } catch (error) {
      if (mine !== latest) return;
      quote.value = null;
      notFound.value = isApiError(error) && (error.status === 404 || error.status === 400);
      if (!notFound.value) failure.value = errorMessage(error);
    } finally {
      if (mine === latest) loading.value = false;
    }
  }

  /** Sends the customer's message; the quote goes back to engineering review. Throws on failure. */
  async function requestChange(message: string): Promise<void> {
    if (!quote.value) return;
    quote.value = await requestQuoteChange(quote.value.id, message);
  }

  /** Uploads the chosen files, then reloads so the list shows what the server stored. */
  async function attach(): Promise<void> {
    if (!quote.value) return;
    const stored = await uploads.uploadAll(quote.value.id);
    if (stored.length) {
      uploads.clearDone();
      await load(...shown);
    }
  }

  return { quote, loading, notFound, failure, uploads, load, requestChange, attach };
}
