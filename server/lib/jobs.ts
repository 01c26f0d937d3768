import PgBoss from 'pg-boss';

/**
 * Background jobs in PostgreSQL (pg-boss): side effects such as e-mail never block a request and
 * survive a restart; a job that keeps failing stays in the table where admins can see it.
 */
export type Jobs = PgBoss;

export const QUEUES = { mail: 'mail', refund: 'refund' } as const;

export async function startJobs(databaseUrl: string): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: databaseUrl, max: 4 });
  boss.on('error', (err) => console.error('[jobs]', err.message));
  await boss.start();
  for (const name of Object.values(QUEUES)) await boss.createQueue(name);
  return boss;
}
