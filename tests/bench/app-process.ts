/**
 * The app alone in its own process for the load bench (the load generator must not share the app's
 * event loop): listens on an ephemeral port of 127.0.0.1, prints `{"port":…}` on one line; SIGUSR2
 * starts measuring the delay of its event loop, SIGTERM prints it (`{"eventLoopDelay…":…}`) and stops.
 * Configuration from the environment (the test database, through the bench's caller).
 */
import type { AddressInfo } from 'node:net';
import { monitorEventLoopDelay, performance, type EventLoopUtilization } from 'node:perf_hooks';
import { createDatabase } from '../../db';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/lib/config';
import { discardMailer } from '../../server/lib/mail';
import { closeThermalPools } from '../../server/lib/thermal-pool';

const config = loadConfig({ ...process.env, NODE_ENV: 'test' });
const database = createDatabase(config.DATABASE_URL, 10);
// mail is not what is measured: a quote's notice is dropped here
const app = createApp({ config, database, mailer: discardMailer, clientDir: '/nonexistent' });
const server = app.listen(0, '127.0.0.1', () => {
  console.log(JSON.stringify({ port: (server.address() as AddressInfo).port, appUrl: config.APP_URL }));
});
const delay = monitorEventLoopDelay({ resolution: 10 });
let elu: EventLoopUtilization | undefined;
process.on('SIGUSR2', () => {
  elu = performance.eventLoopUtilization();
  delay.reset();
  delay.enable();
});
process.once('SIGTERM', () => {
  delay.disable();
  // requests still in flight fail as the pool closes: not what is measured
  console.error = () => undefined;
  const ms = (ns: number) => Math.round(ns / 1e4) / 100;
  console.log(JSON.stringify({ eventLoopDelayP50Ms: ms(delay.percentile(50)), eventLoopDelayP99Ms: ms(delay.percentile(99)), eventLoopDelayMaxMs: ms(delay.max), eventLoopBusy: Math.round(performance.eventLoopUtilization(elu).utilization * 100) / 100 }));
  server.close();
  server.closeAllConnections();
  void Promise.all([database.pool.end(), closeThermalPools()]).finally(() => process.exit(0));
});
