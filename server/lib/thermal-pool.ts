/**
 * Sizing and rating off the request loop (issue 9): a pool of worker threads (piscina) runs the
 * thermal engine, so one long search never holds up another request. Each task gets a time budget
 * (THERMAL_TIME_BUDGET_MS) from the moment a worker takes it; past it the worker is terminated (a
 * new one replaces it) and the caller gets 503. The queue is bounded too: when it is full, 503 at once.
 */
import { fileURLToPath } from 'node:url';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import type { DesignEdit } from '../../shared/schemas/quotes';
import type { Design, RateRequest, RateResult, SizeRequest, SizeResult } from '../../shared/schemas/thermal';
import { ThermalInputError } from '../../shared/thermal/errors';
import type { Config } from './config';
import { HttpError } from './errors';
import type { BookRef, ThermalTask, WorkerReply } from './thermal-worker';

const WORKER_ENTRY = fileURLToPath(new URL('./thermal-worker.mjs', import.meta.url));
/** tasks waiting for a worker, per worker, before new ones are refused with 503 */
export const THERMAL_QUEUE_PER_WORKER = 64;

type PoolConfig = Pick<Config, 'THERMAL_WORKERS' | 'THERMAL_TIME_BUDGET_MS'>;

/** one pool per worker count in this process (the app has one; tests may ask for another) */
const pools = new Map<number, Piscina>();

function poolOf(workers: number): Piscina {
  let pool = pools.get(workers);
  if (!pool) {
    pool = new Piscina({
      filename: WORKER_ENTRY,
      minThreads: workers,
      maxThreads: workers,
      maxQueue: workers * THERMAL_QUEUE_PER_WORKER,
      // the .mjs entry registers tsx itself; inheriting `--import tsx` as well would load it twice
      execArgv: [],
    });
    pools.set(workers, pool);
  }
  return pool;
}

export const overBudget = (ms: number) =>
  new HttpError(
    503,
    'over-budget',
    `The computation took longer than its budget (${ms / 1000} s) and was stopped. Narrow the search (fewer tube sizes, materials, pass counts or layouts, a smaller shell) or try again later.`,
  );

const busy = () => new HttpError(503, 'busy', 'The thermal service is busy with other requests; try again in a moment.');

/** Starts the pool's threads now, so the first request does not wait for them to load the engine. */
export function startThermalPool(config: PoolConfig): void {
  poolOf(config.THERMAL_WORKERS);
}

/** Runs one task in the pool within the budget; engine and HTTP errors come back as themselves. */
export async function runThermal(config: PoolConfig, task: ThermalTask): Promise<unknown> {
  const pool = poolOf(config.THERMAL_WORKERS);
  const budget = config.THERMAL_TIME_BUDGET_MS;
  const abort = new AbortController();
  const { port1, port2 } = new MessageChannel();
  let timer: NodeJS.Timeout | undefined;
  port1.once('message', () => {
    timer = setTimeout(() => abort.abort(), budget);
  });
  let reply: WorkerReply;
  try {
    reply = await pool.run({ ...task, started: port2 }, { signal: abort.signal, transferList: [port2] });
  } catch (err) {
    if (abort.signal.aborted) throw overBudget(budget);
    if (err instanceof Error && err.message === 'Task queue is at limit') throw busy();
    throw err;
  } finally {
    clearTimeout(timer);
    port1.close();
  }
  if (reply.ok) return reply.value;
  const e = reply.error;
  if (e.kind === 'thermal') throw new ThermalInputError(e.code, e.message, e.field);
  if (e.kind === 'http') throw new HttpError(e.status, e.code, e.message, e.fields);
  throw new Error(`thermal worker: ${e.message}`);
}

export const rateInPool = (config: PoolConfig, request: RateRequest) =>
  runThermal(config, { kind: 'rate', request }) as Promise<RateResult>;

export const sizeInPool = (config: PoolConfig, request: SizeRequest, opts: { book?: BookRef; maxCandidates?: number } = {}) =>
  runThermal(config, { kind: 'size', request, ...opts }) as Promise<SizeResult>;

export const evaluateInPool = (config: PoolConfig, duty: SizeRequest, edit: DesignEdit, book: BookRef) =>
  runThermal(config, { kind: 'evaluate', duty, edit, book }) as Promise<Design>;

/** Stops every pool's threads (tests, shutdown); idle threads do not keep the process alive anyway. */
export async function closeThermalPools(): Promise<void> {
  const all = [...pools.values()];
  pools.clear();
  await Promise.all(all.map((p) => p.destroy()));
}

export type { BookRef };
