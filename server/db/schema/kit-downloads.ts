import { customType, index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { KitFileHash, KitSummary } from '../../../shared/schemas/kit-history';
import { presets } from './presets';
import { printerProfiles } from './printer-profiles';
import { teams } from './teams';
import { users } from './users';

// drizzle-orm has no bytea column yet; node-postgres reads and writes Buffers for it.
const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'bytea' });

/**
 * The kit history: every kit a signed-in member downloaded through the team, with the full resolved request,
 * the preset and version and printer profile it came from (names copied, so the entry still reads after they
 * are renamed or deleted), the manifest summary, a SHA-256 of each STL, and the original zip so that both
 * can be offered when a later Seamwright builds different geometry.
 */
export const kitDownloads = pgTable(
  'kit_downloads',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    userId: uuid().references(() => users.id, { onDelete: 'set null' }),
    userName: text(),
    presetId: uuid().references(() => presets.id, { onDelete: 'set null' }),
    presetName: text(),
    presetVersion: integer(),
    printerProfileId: uuid().references(() => printerProfiles.id, { onDelete: 'set null' }),
    printerProfileName: text(),
    calibration: jsonb().$type<{ offsetMm: number; source: string } | null>(),
    request: jsonb().$type<Record<string, unknown>>().notNull(),
    summary: jsonb().$type<KitSummary>().notNull(),
    files: jsonb().$type<KitFileHash[]>().notNull(),
    fileName: text().notNull(),
    engineVersion: text().notNull(),
    zip: bytea().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('kit_downloads_team_created_idx').on(t.teamId, t.createdAt)],
);
