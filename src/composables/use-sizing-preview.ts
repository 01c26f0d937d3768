/**
 * Live preview while typing: ~250 ms after the last change, the duty goes to a Web Worker that runs
 * the shared engine; only the answer to the latest duty is shown. The server's answer ("Size it")
 * stays the authority.
 */
import { onBeforeUnmount, ref, watch, type Ref } from 'vue';
import type { SizeRequestInput } from '@shared/schemas/thermal';
import type { PreviewReply, PreviewSummary } from '../views/sizing/sizing.worker';

export type PreviewState =
  | { status: 'idle' }
  | { status: 'incomplete' }
  | { status: 'running'; last?: PreviewSummary }
  | { status: 'ready'; summary: PreviewSummary }
  | { status: 'refused'; message: string };

const DEBOUNCE_MS = 250;

export function useSizingPreview(input: Ref<SizeRequestInput | null>) {
  const state = ref<PreviewState>({ status: 'idle' });
  let worker: Worker | null = null;
  let latest = 0;
  let timer: ReturnType<typeof setTimeout> | undefined;

  function ensureWorker(): Worker | null {
    if (worker) return worker;
    if (typeof Worker === 'undefined') return null;
    worker = new Worker(new URL('../views/sizing/sizing.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (event: MessageEvent<PreviewReply>) => {
      const reply = event.data;
      if (reply.id !== latest) return; // an older duty: the person has typed since
      state.value = reply.ok ? { status: 'ready', summary: reply.summary } : { status: 'refused', message: reply.message };
    };
    worker.onerror = () => {
      state.value = { status: 'refused', message: 'The preview is not available in this browser; “Size it” still works.' };
    };
    return worker;
  }

  function run(duty: SizeRequestInput | null): void {
    if (!duty) {
      latest++;
      state.value = { status: 'incomplete' };
      return;
    }
    const w = ensureWorker();
    if (!w) return;
    latest++;
    const last = state.value.status === 'ready' ? state.value.summary : undefined;
    state.value = { status: 'running', last };
    // A plain copy: reactive proxies cannot cross to a worker.
    w.postMessage({ id: latest, input: JSON.parse(JSON.stringify(duty)) as SizeRequestInput });
  }

  watch(
    () => JSON.stringify(input.value),
    () => {
      clearTimeout(timer);
      timer = setTimeout(() => run(input.value), DEBOUNCE_MS);
    },
    { immediate: true },
  );

  onBeforeUnmount(() => {
    clearTimeout(timer);
    worker?.terminate();
    worker = null;
  });

  return { state };
}
