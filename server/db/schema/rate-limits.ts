import { index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/**
 * Attempts per client and route family in the current window, shared by every server process on the
 * database (a limit kept in one process's memory would give each process its own allowance). Rows whose
 * window has passed are reset on the next attempt and swept by the hourly clean-up job.
 */
export const rateLimits = pgTable(
  'rate_limits',
  {
    // "<scope>:<route family>:<client address>"
    key: text().primaryKey(),
    hits: integer().notNull(),
    resetAt: timestamp({ withTimezone: true }).notNull(),
  },
  (t) => [index('rate_limits_reset_at_idx').on(t.resetAt)],
);
