/**
 * What one thermal worker thread does: rate, size or evaluate with the shared engine, and send back
 * either the result or the error in a form that survives the trip between threads (a thrown class
 * does not: it arrives as a plain Error). The price book's cost function is rebuilt here from the
 * book's data, once per book version.
 */
import type { MessagePort } from 'node:worker_threads';
import { designMarginOf, shopLimitsOf, type PriceBook } from '../../shared/schemas/price-book';
import type { DesignEdit } from '../../shared/schemas/quotes';
import type { RateRequest, SizeRequest } from '../../shared/schemas/thermal';
import type { CostInput } from '../../shared/thermal/cost-proxy';
import { evaluateDesign } from '../../shared/thermal/evaluate';
import { ThermalInputError } from '../../shared/thermal/errors';
import { costFromPriceBook } from '../features/pricing/cost';
import { rateDesign, sizeCooler } from '../features/thermal/service';
import { HttpError } from './errors';

/** The price book a quote is sized with: its version names the cost function's cache slot. */
export interface BookRef {
  version: number;
  createdAt?: Date | string;
  data: PriceBook;
}

export type ThermalTask =
  | { kind: 'rate'; request: RateRequest }
  | { kind: 'size'; request: SizeRequest; book?: BookRef; maxCandidates?: number }
  | { kind: 'evaluate'; duty: SizeRequest; edit: DesignEdit; book: BookRef };

export type WorkerError =
  | { kind: 'thermal'; code: string; message: string; field?: string }
  | { kind: 'http'; status: number; code: string; message: string; fields?: Record<string, string> }
  | { kind: 'other'; message: string };

export type WorkerReply = { ok: true; value: unknown } | { ok: false; error: WorkerError };

/** cost functions by book version; a handful, the active one is nearly always the newest */
const costs = new Map<string, (d: CostInput) => number>();
function costOf(book: BookRef): (d: CostInput) => number {
  const key = `${book.version}|${book.createdAt ? new Date(book.createdAt).toISOString() : ''}`;
  let f = costs.get(key);
  if (!f) {
    f = costFromPriceBook(book.data);
    if (costs.size >= 4) costs.delete(costs.keys().next().value!);
    costs.set(key, f);
  }
  return f;
}

function compute(task: ThermalTask): unknown {
  switch (task.kind) {
    case 'rate':
      return rateDesign(task.request);
    case 'size':
      return sizeCooler(task.request, {
        ...(task.book ? { costOf: costOf(task.book), designMargin_pct: designMarginOf(task.book.data), shop: shopLimitsOf(task.book.data) } : {}),
        ...(task.maxCandidates ? { maxCandidates: task.maxCandidates } : {}),
      });
    case 'evaluate':
      return evaluateDesign(task.duty, task.edit, costOf(task.book));
  }
}

function serialise(err: unknown): WorkerError {
  if (err instanceof ThermalInputError) return { kind: 'thermal', code: err.code, message: err.message, ...(err.field ? { field: err.field } : {}) };
  if (err instanceof HttpError) return { kind: 'http', status: err.status, code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) };
  return { kind: 'other', message: err instanceof Error ? (err.stack ?? err.message) : String(err) };
}

/** piscina's task function; `started` tells the pool the task left the queue (its budget starts). */
export default function run(task: ThermalTask & { started?: MessagePort }): WorkerReply {
  const { started, ...rest } = task;
  started?.postMessage('started');
  try {
    return { ok: true, value: compute(rest as ThermalTask) };
  } catch (err) {
    return { ok: false, error: serialise(err) };
  }
}
