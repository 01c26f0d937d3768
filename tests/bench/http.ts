/**
 * `POST /api/thermal/size` over loopback: the app in this process on an ephemeral port, a typical
 * duty sent `rounds` times one after another; prints the median and the 90th percentile in ms.
 * Needs the database (the rate limiter counts in it): run through `npm run bench`.
 */
import type { AddressInfo } from 'node:net';
import { createDatabase } from '../../db';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/lib/config';
import { discardMailer } from '../../server/lib/mail';

const duty = {
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85, outletTemp_C: 40 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 20, foulingInside_m2K_W: 0.00018, foulingOutside_m2K_W: 0.00018 },
  constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
};

const pct = (xs: number[], p: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(xs.length * p))]!;

export async function run(rounds = 40): Promise<Record<string, number>> {
  const config = loadConfig({ ...process.env, NODE_ENV: 'test' });
  const database = createDatabase(config.DATABASE_URL, 4);
  const app = createApp({ config, database, mailer: discardMailer, clientDir: '/nonexistent' });
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api/thermal/size`;
  const body = JSON.stringify(duty);
  const times: number[] = [];
  try {
    for (let i = 0; i < rounds + 3; i++) {
      const t0 = performance.now();
      const res = await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
      if (res.status !== 200) throw new Error(`size answered ${res.status}: ${await res.text()}`);
      await res.arrayBuffer();
      if (i >= 3) times.push(performance.now() - t0); // the first calls fill the tube-layout cache
    }
    await database.pool.query(`delete from rate_limit_hits where key like 'thermal:%'`);
  } finally {
    server.close();
    await database.pool.end();
  }
  const figures = { httpSizeMedianMs: pct(times, 0.5), httpSizeP90Ms: pct(times, 0.9) };
  console.log(`POST /api/thermal/size over loopback:      median ${figures.httpSizeMedianMs.toFixed(1)} ms, p90 ${figures.httpSizeP90Ms.toFixed(1)} ms (${rounds} requests)`);
  return figures;
}
