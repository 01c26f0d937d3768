import { defineStore } from 'pinia';
import { ref } from 'vue';

export type NoticeKind = 'info' | 'success' | 'warning' | 'error';

/** A one-shot message carried across a redirect (e.g. "that page is for administrators"). */
export const useNoticeStore = defineStore('notice', () => {
  const notice = ref<{ kind: NoticeKind; text: string } | null>(null);
  let navigationsSeen = 0;

  function show(kind: NoticeKind, text: string): void {
    notice.value = { kind, text };
    navigationsSeen = 0;
  }

  /** Called after each completed navigation: the notice lives on the page it led to, then goes. */
  function afterNavigation(): void {
    if (notice.value && ++navigationsSeen > 1) notice.value = null;
  }

  function dismiss(): void {
    notice.value = null;
  }

  return { notice, show, dismiss, afterNavigation };
});
