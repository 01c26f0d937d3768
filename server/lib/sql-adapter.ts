import { sql, type SQL } from 'drizzle-orm';
import type PgBoss from 'pg-boss';
import type { Db } from '../../db';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
/** A Drizzle database or an open transaction: whatever a repository function may write through. */
export type Executor = Db | Tx;

/**
 * pg-boss's `db` option (executeSql(text, values)) over a Drizzle executor, so that a job is inserted
 * in the caller's transaction: committed with the change it belongs to, or not at all. `$n`
 * placeholders become Drizzle parameters (drizzle renumbers them).
 */
export function jobsDb(executor: Executor): PgBoss.Db {
  return {
    async executeSql(text: string, values: unknown[] = []) {
      const parts = text.split(/\$(\d+)/);
      const chunks: SQL[] = [];
      parts.forEach((part, i) => {
        if (i % 2 === 0) chunks.push(sql.raw(part));
        // an explicit parameter: a bare `${undefined}` would render as nothing in Drizzle's template
        else chunks.push(sql`${sql.param(values[Number(part) - 1] ?? null)}`);
      });
      const result = await executor.execute(sql.join(chunks));
      return { rows: result.rows as unknown[] as never[] };
    },
  };
}
