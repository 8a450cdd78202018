import { sql } from 'drizzle-orm';
import { doublePrecision, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import type { Material } from '../../../shared/schemas/joint-options';
import type { ClearanceAdjustments } from '../../../shared/schemas/material';
import { teams } from './teams';
import { users } from './users';

/**
 * A team's own material: a named variant of a built-in base material with its shrinkage (percent; null =
 * the base's default) and clearance adjustments per fit class (mm per side).
 */
export const teamMaterials = pgTable(
  'team_materials',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    baseMaterial: text().$type<Material>().notNull(),
    shrinkagePercent: doublePrecision(),
    clearanceAdjustments: jsonb().$type<ClearanceAdjustments>().notNull(),
    notes: text().notNull().default(''),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    // Names are unique per team without regard to case, so "Helmet seam" and "helmet seam" cannot both exist.
    uniqueIndex('team_materials_team_name_idx').on(t.teamId, sql`lower(${t.name})`),
  ],
);
