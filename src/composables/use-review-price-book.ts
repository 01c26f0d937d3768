/**
 * The admin price-book editor: a working copy of the active version, edited in place, sent whole
 * as the next version (`PUT /api/admin/price-book`) with the version it started from and a note. Money in the copy stays in minor units; the
 * inputs convert to and from major units. A 400's field errors are keyed by path (`tubes.3.perMetre_minor`).
 */
import { reactive, ref } from 'vue';
import type { PriceBook } from '@shared/schemas/price-book';
import { errorMessage, isApiError } from '../api/http';
import { fetchPriceBook, savePriceBook, type StoredPriceBook } from '../api/price-book';

export function useReviewPriceBook() {
  const stored = ref<StoredPriceBook | null>(null);
  const book = ref<PriceBook | null>(null);
  const note = ref('');
  const loading = ref(false);
  const saving = ref(false);
  const failure = ref<string | null>(null);
  const fields = reactive<Record<string, string>>({});
  const saved = ref(false);
  /** the last save was refused because another admin saved meanwhile */
  const stale = ref(false);

  function take(s: StoredPriceBook): void {
    stored.value = s;
    book.value = structuredClone(s.priceBook);
  }

  async function load(): Promise<void> {
    loading.value = true;
    failure.value = null;
    try {
      take(await fetchPriceBook());
    } catch (error) {
      failure.value = errorMessage(error);
    } finally {
      loading.value = false;
    }
  }

  async function save(): Promise<void> {
    if (!book.value || !stored.value) return;
    failure.value = null;
    saved.value = false;
    stale.value = false;
    for (const key of Object.keys(fields)) delete fields[key];
    if (!note.value.trim()) {
      fields.note = 'Say what changed.';
      failure.value = 'Say what changed: the note is kept with the version.';
      return;
    }
    saving.value = true;
    try {
      take(await savePriceBook(book.value, stored.value.version, note.value.trim()));
      note.value = '';
      saved.value = true;
    } catch (error) {
      failure.value = errorMessage(error);
      // another admin saved since this edit started: their version must not be silently reverted
      stale.value = isApiError(error) && error.code === 'stale-version';
      if (isApiError(error)) for (const [key, message] of Object.entries(error.fields)) fields[key.replace(/^priceBook\./, '')] = message;
    } finally {
      saving.value = false;
    }
  }

  const discard = () => stored.value && take(stored.value);
  return { stored, book, note, loading, saving, failure, fields, saved, stale, load, save, discard };
}

export type ReviewPriceBook = ReturnType<typeof useReviewPriceBook>;
