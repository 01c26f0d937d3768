/**
 * The mail log page's state: status, search and page are sent to `GET /api/admin/mail` (the server
 * filters and pages); one message is open in the drawer; a resend opens the queued copy and shows
 * every status, so the copy appears at the top of the list.
 */
import { reactive, ref } from 'vue';
import type { MailDetail, MailStatus } from '@shared/schemas/mail-log';
import { errorMessage } from '../../../api/http';
import { fetchMail, fetchMailLog, resendMail } from '../../../api/mail-log';
import { usePagedList } from '../../../composables/use-paged-list';

export function useMailLog() {
  const filters = reactive({ status: null as MailStatus | null, q: '', page: 1, pageSize: 20 });
  const list = usePagedList(filters, (f) => fetchMailLog({ status: f.status ?? undefined, q: f.q.trim() || undefined, page: f.page, pageSize: f.pageSize }));

  const openId = ref<string | null>(null);
  const message = ref<MailDetail | null>(null);
  const opening = ref(false);
  const openError = ref<string | null>(null);
  const resending = ref(false);
  const resendError = ref<string | null>(null);
  /** the message the open one was just resent from (a copy freshly queued) */
  const resentFrom = ref<MailDetail | null>(null);

  async function open(id: string): Promise<void> {
    openId.value = id;
    message.value = null;
    resentFrom.value = null;
    openError.value = null;
    resendError.value = null;
    opening.value = true;
    try {
      const found = await fetchMail(id);
      if (openId.value === id) message.value = found;
    } catch (error) {
      if (openId.value === id) openError.value = errorMessage(error);
    } finally {
      if (openId.value === id) opening.value = false;
    }
  }

  function close(): void {
    openId.value = null;
    message.value = null;
    resentFrom.value = null;
  }

  async function resend(): Promise<void> {
    const original = message.value;
    if (!original) return;
    resending.value = true;
    resendError.value = null;
    try {
      const copy = await resendMail(original.id);
      resentFrom.value = original;
      openId.value = copy.id;
      message.value = copy;
      // back to every status on page 1, where the copy is the newest row
      if (filters.status !== null) filters.status = null; // the filter watcher reloads from page 1
      else if (filters.page !== 1) filters.page = 1;
      else void list.load();
    } catch (error) {
      resendError.value = errorMessage(error);
    } finally {
      resending.value = false;
    }
  }

  return { filters, ...list, openId, message, opening, openError, open, close, resend, resending, resendError, resentFrom };
}
