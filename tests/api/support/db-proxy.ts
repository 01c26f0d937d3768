/**
 * A TCP relay between an app under test and the test PostgreSQL, to stage an outage: `cut()` stops
 * listening and drops every open connection (new connections are refused, as when the server is
 * down), `restore()` listens again on the same port.
 */
import net from 'node:net';

export interface DbProxy {
  port: number;
  /** the test DATABASE_URL rewritten to go through the relay */
  url(databaseUrl: string): string;
  cut(): Promise<void>;
  restore(): Promise<void>;
  close(): Promise<void>;
}

export async function startDbProxy(targetHost: string, targetPort: number): Promise<DbProxy> {
  const open = new Set<net.Socket>();
  const track = (s: net.Socket) => {
    open.add(s);
    s.on('close', () => open.delete(s));
    s.on('error', () => s.destroy());
  };
  const server = net.createServer((client) => {
    const upstream = net.connect(targetPort, targetHost);
    track(client);
    track(upstream);
    client.pipe(upstream).pipe(client);
    client.on('close', () => upstream.destroy());
    upstream.on('close', () => client.destroy());
  });
  const listen = (port: number) =>
    new Promise<number>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => resolve((server.address() as net.AddressInfo).port));
    });
  const port = await listen(0);
  return {
    port,
    url: (databaseUrl) => databaseUrl.replace(/@[^/@]+\//, `@127.0.0.1:${port}/`),
    async cut() {
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      for (const s of open) s.destroy();
      await closed;
    },
    async restore() {
      await listen(port);
    },
    async close() {
      for (const s of open) s.destroy();
      if (server.listening) await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
