import { sql } from 'drizzle-orm';
import { doublePrecision, index, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import type { Process } from '../../../shared/schemas/joint-options';
import type { CalibrationEntry } from '../../../shared/schemas/printer-profile';
import { teams } from './teams';
import { users } from './users';

/**
 * A team's printer: process, build volume and nozzle in mm, and its calibration table (one clearance
 * offset per material and fit class, checked by shared/schemas/printer-profile.ts before it is stored).
 */
export const printerProfiles = pgTable(
  'printer_profiles',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    process: text().$type<Process>().notNull(),
    buildX: doublePrecision().notNull(),
    buildY: doublePrecision().notNull(),
    buildZ: doublePrecision().notNull(),
    nozzleDiameter: doublePrecision(),
    layerHeight: doublePrecision().notNull(),
    notes: text().notNull().default(''),
    calibration: jsonb().$type<CalibrationEntry[]>().notNull().default([]),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    // Names are unique per team without regard to case, so "Helmet seam" and "helmet seam" cannot both exist.
    uniqueIndex('printer_profiles_team_name_idx').on(t.teamId, sql`lower(${t.name})`),
    index('printer_profiles_team_updated_idx').on(t.teamId, t.updatedAt),
  ],
);
