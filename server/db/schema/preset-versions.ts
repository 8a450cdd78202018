import { integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { presets } from './presets';
import { users } from './users';

/**
 * Every saved version of a preset, never changed once written: the whole preset as it was saved, who saved
 * it and when, what changed in plain words, and for a restore the version it brought back. The author's
 * name is copied so the history still reads after the account is gone.
 */
export const presetVersions = pgTable(
  'preset_versions',
  {
    presetId: uuid()
      .notNull()
      .references(() => presets.id, { onDelete: 'cascade' }),
    version: integer().notNull(),
    name: text().notNull(),
    description: text().notNull(),
    tags: text().array().notNull(),
    printerProfileId: uuid(),
    schemaVersion: integer().notNull(),
    settings: jsonb().$type<Record<string, unknown>>().notNull(),
    changes: jsonb().$type<string[]>().notNull(),
    restoredFrom: integer(),
    authorId: uuid().references(() => users.id, { onDelete: 'set null' }),
    authorName: text(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.presetId, t.version] })],
);
