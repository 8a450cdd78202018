import { index, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './users';

/** What a mailed single-use link is for. */
export const accountTokenPurpose = pgEnum('account_token_purpose', ['verify-email', 'reset-password']);

/**
 * Single-use tokens mailed as links (e-mail verification, password reset). Only the SHA-256 is
 * stored; a token is deleted as it is used, so a second use finds nothing.
 */
export const accountTokens = pgTable(
  'account_tokens',
  {
    tokenHash: text().primaryKey(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: accountTokenPurpose().notNull(),
    // The address the link was sent to: verifying proves this address, not a later one.
    email: text().notNull(),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('account_tokens_user_id_idx').on(t.userId)],
);
