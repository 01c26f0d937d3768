/**
 * Fault injection for the API tests: a temporary trigger that makes inserts into one table fail
 * for the rows matching `when` (scoped to one test's own records, so parallel test files are not
 * affected), removed again whatever the test did.
 */
import type { Pool } from 'pg';

export async function withFailingInsert<T>(pool: Pool, table: 'quote_events' | 'mail_log', when: string, run: () => Promise<T>): Promise<T> {
  const name = `test_fail_${Date.now().toString(36)}_${Math.random().toString(36).slice(2, 8)}`;
  await pool.query(`create function ${name}() returns trigger language plpgsql as $$ begin raise exception 'injected failure'; end $$`);
  await pool.query(`create trigger ${name} before insert on ${table} for each row when (${when}) execute function ${name}()`);
  try {
    return await run();
  } finally {
    await pool.query(`drop trigger if exists ${name} on ${table}`);
    await pool.query(`drop function if exists ${name}()`);
  }
}

/** mail_log rows whose subject is exactly `subject`. */
export async function mailCount(pool: Pool, subject: string): Promise<number> {
  const { rows } = await pool.query('select count(*)::int as n from mail_log where subject = $1', [subject]);
  return rows[0].n;
}
