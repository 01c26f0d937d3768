/**
 * Opens or saves a server document (build-sheet PDF, drilling CSV) only once it has arrived whole:
 * a refusal shows the server's reason as a message instead of a file holding the error.
 */
import { ref } from 'vue';
import { errorMessage, fetchFile } from '../api/http';

export function useDocument() {
  const busy = ref<string | null>(null);
  const error = ref<string | null>(null);

  /** `path` under /api; `filename` saves it, without one it opens in a new tab (a PDF) */
  async function get(key: string, path: string, filename?: string): Promise<void> {
    busy.value = key;
    error.value = null;
    try {
      const url = URL.createObjectURL(await fetchFile(path));
      const a = document.createElement('a');
      a.href = url;
      if (filename) a.download = filename;
      else (a.target = '_blank'), (a.rel = 'noopener');
      a.click();
      setTimeout(() => URL.revokeObjectURL(url), 60_000);
    } catch (e) {
      error.value = errorMessage(e);
    } finally {
      busy.value = null;
    }
  }
  return { busy, error, get };
}
