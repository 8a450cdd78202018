import { boolean, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/**
 * A team shares presets, printer profiles and kit history. Every account gets a personal team at
 * sign-up (`personal`), which cannot be deleted; other teams are created by their first owner.
 */
export const teams = pgTable('teams', {
  id: uuid().primaryKey().defaultRandom(),
  name: text().notNull(),
  personal: boolean().notNull().default(false),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});
