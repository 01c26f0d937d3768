import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Db = NodePgDatabase<typeof schema>;

export interface Database {
  pool: pg.Pool;
  db: Db;
}

export function createDatabase(url: string, max = 10): Database {
  // a request waits at most 5 s for a connection: an unreachable database is an answer (503), not a hang
  const pool = new pg.Pool({ connectionString: url, max, connectionTimeoutMillis: 5000 });
  pool.on('error', (err) => console.error('[db] idle client error', err.message));
  return { pool, db: drizzle(pool, { schema }) };
}

export { schema };
