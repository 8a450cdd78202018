import { sql } from 'drizzle-orm';
import { pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';

/** Units a person sees and types lengths in; shared/schemas/account.ts holds the same list for the API. */
export const lengthUnit = pgEnum('length_unit', ['mm', 'in']);

/**
 * A person who signs in. `email` is stored as typed after normalisation (trimmed, NFKC, domain in
 * lower case); uniqueness ignores case so "Ada@x" and "ada@x" cannot become two accounts.
 */
export const users = pgTable(
  'users',
  {
    id: uuid().primaryKey().defaultRandom(),
    email: text().notNull(),
    name: text().notNull(),
    passwordHash: text().notNull(),
    // Null until the address is confirmed through the link in the verification e-mail.
    emailVerifiedAt: timestamp({ withTimezone: true }),
    // Display and entry only: every stored and sent length stays in millimetres.
    units: lengthUnit().notNull().default('mm'),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('users_email_lower_unique').on(sql`lower(${t.email})`)],
);
