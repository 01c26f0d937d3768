import type { Options, Store } from 'express-rate-limit';
import type pg from 'pg';

/**
 * An express-rate-limit store in PostgreSQL, so that every app process counts the same hits
 * (the app is stateless; two processes behind a balancer must behave as one).
 * One row per key; a hit after the window ends starts a new window.
 */
export class PgRateLimitStore implements Store {
  readonly localKeys = false;
  prefix: string;
  private windowMs = 60_000;

  constructor(private readonly pool: pg.Pool, prefix: string) {
    this.prefix = `${prefix}:`;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string) {
    const { rows } = await this.pool.query<{ hits: number; reset_at: Date }>(
      `insert into rate_limit_hits (key, hits, reset_at)
         values ($1, 1, now() + $2 * interval '1 millisecond')
       on conflict (key) do update set
         hits = case when rate_limit_hits.reset_at <= now() then 1 else rate_limit_hits.hits + 1 end,
         reset_at = case when rate_limit_hits.reset_at <= now() then excluded.reset_at else rate_limit_hits.reset_at end
       returning hits, reset_at`,
      [this.prefix + key, this.windowMs],
    );
    const row = rows[0]!;
    return { totalHits: row.hits, resetTime: row.reset_at };
  }

  async decrement(key: string) {
    await this.pool.query(`update rate_limit_hits set hits = greatest(hits - 1, 0) where key = $1`, [this.prefix + key]);
  }

  async resetKey(key: string) {
    await this.pool.query(`delete from rate_limit_hits where key = $1`, [this.prefix + key]);
  }
}
