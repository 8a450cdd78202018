import { eq, lte, sql } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { rateLimits } from '../../db/schema';

/** Hits in the current window and when it ends, after one more hit. */
export interface WindowCount {
  hits: number;
  resetAt: Date;
}

/**
 * Counts one hit for `key` in one statement, so processes racing on the same client count every hit: a key
 * whose window has passed starts a new window of `windowMs` with this hit as its first.
 */
export async function countHit(db: Executor, key: string, windowMs: number): Promise<WindowCount> {
  const fresh = sql`now() + ${windowMs} * interval '1 millisecond'`;
  const expired = sql`${rateLimits.resetAt} <= now()`;
  const [row] = await db
    .insert(rateLimits)
    .values({ key, hits: 1, resetAt: fresh })
    .onConflictDoUpdate({
      target: rateLimits.key,
      set: {
        hits: sql`case when ${expired} then 1 else ${rateLimits.hits} + 1 end`,
        resetAt: sql`case when ${expired} then excluded.reset_at else ${rateLimits.resetAt} end`,
      },
    })
    .returning({ hits: rateLimits.hits, resetAt: rateLimits.resetAt });
  return row!;
}

/** Takes one hit back (a request the limiter was told not to count). */
export async function uncountHit(db: Executor, key: string): Promise<void> {
  await db
    .update(rateLimits)
    .set({ hits: sql`greatest(${rateLimits.hits} - 1, 0)` })
    .where(eq(rateLimits.key, key));
}

/** Forgets a key's window. */
export async function resetKey(db: Executor, key: string): Promise<void> {
  await db.delete(rateLimits).where(eq(rateLimits.key, key));
}

/** Deletes every window that has ended; returns how many. */
export async function sweepEnded(db: Executor): Promise<number> {
  const gone = await db
    .delete(rateLimits)
    .where(lte(rateLimits.resetAt, sql`now()`))
    .returning({ key: rateLimits.key });
  return gone.length;
}
