import { pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/**
 * A studio is the organisation that owns printers and shares joint presets. The demo data
 * creates one; accounts and teams build on it.
 */
export const studios = pgTable('studios', {
  id: uuid().primaryKey().defaultRandom(),
  slug: text().notNull().unique(),
  name: text().notNull(),
  tagline: text().notNull().default(''),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});
