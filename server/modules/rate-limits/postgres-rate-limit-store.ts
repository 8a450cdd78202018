import type { Options, Store, ClientRateLimitInfo } from 'express-rate-limit';
import type { Database } from '../../db/client';
import { countHit, resetKey, uncountHit } from './rate-limits.repository';

/**
 * An express-rate-limit store in PostgreSQL, so every server process on the database shares one allowance
 * per client. Keys are "<scope>:<family>:<client>"; the scope keeps separate deployments (or test apps) on
 * one database apart.
 */
export class PostgresRateLimitStore implements Store {
  readonly prefix: string;
  // The counts live outside this process: express-rate-limit must not assume it sees every hit.
  readonly localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly db: Database,
    scope: string,
    family: string,
  ) {
    this.prefix = `${scope}:${family}:`;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const { hits, resetAt } = await countHit(this.db, this.prefix + key, this.windowMs);
    return { totalHits: hits, resetTime: resetAt };
  }

  async decrement(key: string): Promise<void> {
    await uncountHit(this.db, this.prefix + key);
  }

  async resetKey(key: string): Promise<void> {
    await resetKey(this.db, this.prefix + key);
  }
}
