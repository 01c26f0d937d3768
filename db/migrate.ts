/** Applies the committed SQL migrations in db/migrations (never `drizzle-kit push`). */
import { fileURLToPath } from 'node:url';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { loadConfig } from '../server/lib/config';
import { createDatabase } from './index';

const { DATABASE_URL } = loadConfig();
const { db, pool } = createDatabase(DATABASE_URL, 1);
try {
  await migrate(db, { migrationsFolder: fileURLToPath(new URL('./migrations', import.meta.url)) });
  console.log('[db] migrations applied');
} finally {
  await pool.end();
}
