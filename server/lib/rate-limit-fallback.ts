import { MemoryStore, type Options, type Store } from 'express-rate-limit';
import { isDatabaseUnavailable } from './outage';

/**
 * Rate limits fail OPEN during a database outage, with a local fallback: while PostgreSQL cannot be
 * reached, hits are counted in this process's memory (each process then limits on its own, so the
 * effective limit is the configured one times the number of processes) instead of refusing every
 * request or letting every request through. Other errors still reach the error middleware.
 */
export class FallbackRateLimitStore implements Store {
  readonly localKeys = false;
  private readonly memory = new MemoryStore();
  private warned = false;

  constructor(private readonly primary: Store) {}

  get prefix() {
    return this.primary.prefix;
  }

  init(options: Options): void {
    this.primary.init?.(options);
    this.memory.init(options);
  }

  async increment(key: string) {
    try {
      return await this.primary.increment(key);
    } catch (err) {
      return this.fallback(err, () => this.memory.increment(key));
    }
  }

  async decrement(key: string) {
    try {
      await this.primary.decrement(key);
    } catch (err) {
      await this.fallback(err, () => this.memory.decrement(key));
    }
  }

  async resetKey(key: string) {
    try {
      await this.primary.resetKey(key);
    } catch (err) {
      await this.fallback(err, () => this.memory.resetKey(key));
    }
  }

  private async fallback<T>(err: unknown, local: () => Promise<T>): Promise<T> {
    if (!isDatabaseUnavailable(err)) throw err;
    if (!this.warned) {
      this.warned = true;
      console.error(`[rate-limit] database unavailable; counting ${this.prefix ?? ''} hits in memory until it is back`);
      setTimeout(() => (this.warned = false), 60_000).unref();
    }
    return local();
  }
}
