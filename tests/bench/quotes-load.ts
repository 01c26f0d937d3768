/**
 * Load on the main flow (issue 9): 50 connections on `POST /api/quotes` (a signed-in customer, each
 * request a full sizing with the price book) beside one connection on `GET /api/health`, for
 * LOAD_SECONDS (default 15), against the app in a process of its own. Prints req/s, p50 and p99 of
 * both; the health figures show whether sizing holds other requests up. Figures are printed, never
 * asserted. Needs a migrated, seeded database (the demo customer): `npm run bench:quotes-load`
 * with DATABASE_URL set (the test environment's, for instance). The quotes it makes are deleted.
 */
import { spawn } from 'node:child_process';
import { once } from 'node:events';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import pg from 'pg';
import { loadConfig } from '../../server/lib/config';

const SECONDS = Number(process.env.LOAD_SECONDS ?? 15);
const CONNECTIONS = 50;
const CUSTOMER = 'customer@pellmar.example';
const tag = `bench-load-${Date.now().toString(36)}`;

/** An invented hydraulic-oil cooler, as in the quote API tests. */
const duty = {
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2.0, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
};

interface LoopDelay { eventLoopDelayP50Ms: number; eventLoopDelayP99Ms: number; eventLoopDelayMaxMs: number; eventLoopBusy: number }

async function startApp(): Promise<{ base: string; origin: string; measure: () => void; stop: () => Promise<LoopDelay> }> {
  // BENCH_NODE_ARGS: extra flags for the app's node, e.g. `--cpu-prof` to see where its time goes
  const extra = process.env.BENCH_NODE_ARGS?.split(' ').filter(Boolean) ?? [];
  const child = spawn(process.execPath, [...extra, '--import', 'tsx', fileURLToPath(new URL('./app-process.ts', import.meta.url))], {
    stdio: ['ignore', 'pipe', 'inherit'],
    env: process.env,
  });
  const lines = createInterface({ input: child.stdout! });
  const [first] = (await once(lines, 'line')) as [string];
  const { port, appUrl } = JSON.parse(first) as { port: number; appUrl: string };
  return {
    base: `http://127.0.0.1:${port}`,
    origin: appUrl,
    measure: () => child.kill('SIGUSR2'),
    stop: async () => {
      const next = once(lines, 'line') as Promise<[string]>;
      child.kill('SIGTERM');
      const [[report]] = await Promise.all([next, once(child, 'exit')]);
      return JSON.parse(report) as LoopDelay;
    },
  };
}

async function signIn(base: string, origin: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-requested-with': 'bundlesmith', origin },
    body: JSON.stringify({ email: CUSTOMER, password: 'Bundlesmith-demo-1' }),
  });
  if (res.status !== 200) throw new Error(`sign-in answered ${res.status}: ${await res.text()}`);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

const line = (name: string, r: autocannon.Result) =>
  `${name.padEnd(20)} ${(r.requests.total / SECONDS).toFixed(1).padStart(7)} req/s   p50 ${String(r.latency.p50).padStart(6)} ms   p99 ${String(r.latency.p99).padStart(6)} ms   ` +
  `(${r['2xx']} ok, ${r.non2xx} other, ${r.errors} errors, ${r.timeouts} timeouts)`;

export async function run(): Promise<Record<string, number>> {
  const config = loadConfig({ ...process.env, NODE_ENV: 'test' });
  const app = await startApp();
  let stopped = false;
  try {
    const cookie = await signIn(app.base, app.origin);
    const headers = { 'content-type': 'application/json', 'x-requested-with': 'bundlesmith', origin: app.origin, cookie };
    // one quote first: the workers load the engine and the price book's cost function
    const warm = await fetch(`${app.base}/api/quotes`, { method: 'POST', headers, body: JSON.stringify({ duty, quantity: 1, reference: tag }) });
    if (warm.status !== 201) throw new Error(`POST /api/quotes answered ${warm.status}: ${await warm.text()}`);
    app.measure();
    const [quotes, health] = await Promise.all([
      autocannon({ url: `${app.base}/api/quotes`, method: 'POST', headers, body: JSON.stringify({ duty, quantity: 2, reference: tag }), connections: CONNECTIONS, duration: SECONDS, timeout: 60 }),
      autocannon({ url: `${app.base}/api/health`, connections: 1, duration: SECONDS }),
    ]);
    console.log(`Load: ${CONNECTIONS} connections on POST /api/quotes beside 1 on GET /api/health, ${SECONDS} s, THERMAL_WORKERS=${config.THERMAL_WORKERS}`);
    console.log(line('POST /api/quotes', quotes));
    console.log(line('GET /api/health', health));
    const loop = await app.stop();
    stopped = true;
    console.log(`the app's event loop: delay p50 ${loop.eventLoopDelayP50Ms} ms, p99 ${loop.eventLoopDelayP99Ms} ms, max ${loop.eventLoopDelayMaxMs} ms; busy ${Math.round(loop.eventLoopBusy * 100)} % of the time`);
    return {
      ...loop,
      quotesPerSecond: quotes.requests.total / SECONDS, quotesP50Ms: quotes.latency.p50, quotesP99Ms: quotes.latency.p99,
      healthPerSecond: health.requests.total / SECONDS, healthP50Ms: health.latency.p50, healthP99Ms: health.latency.p99,
    };
  } finally {
    if (!stopped) await app.stop();
    const db = new pg.Pool({ connectionString: config.DATABASE_URL, max: 1 });
    await db.query('delete from quotes where reference = $1', [tag]).finally(() => db.end());
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) await run();
