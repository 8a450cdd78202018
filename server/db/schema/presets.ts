import { sql } from 'drizzle-orm';
import { boolean, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { printerProfiles } from './printer-profiles';
import { teams } from './teams';
import { users } from './users';

/**
 * A team's joint preset as it is now (its latest version). `settings` is a kit request without its face,
 * stored in the shape of `schemaVersion` and upgraded when read; `version` counts the saves and is what an
 * edit must be based on (a save from an older version is refused). Every version is in preset_versions.
 */
export const presets = pgTable(
  'presets',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    description: text().notNull().default(''),
    tags: text().array().notNull().default([]),
    printerProfileId: uuid().references(() => printerProfiles.id, { onDelete: 'set null' }),
    version: integer().notNull().default(1),
    schemaVersion: integer().notNull(),
    settings: jsonb().$type<Record<string, unknown>>().notNull(),
    archived: boolean().notNull().default(false),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    // Names are unique per team without regard to case, so "Helmet seam" and "helmet seam" cannot both exist.
    uniqueIndex('presets_team_name_idx').on(t.teamId, sql`lower(${t.name})`),
    index('presets_team_updated_idx').on(t.teamId, t.updatedAt),
  ],
);
