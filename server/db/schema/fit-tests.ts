import { index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { Material } from '../../../shared/schemas/joint-options';
import type { FitTestAnswer } from '../../../shared/schemas/fit-test-answer';
import type { FitTestBest, FitTestCoupon } from '../../../shared/schemas/fit-test';
import { printerProfiles } from './printer-profiles';
import { teams } from './teams';
import { users } from './users';

/**
 * A printed fit-test coupon as a member recorded it: the coupon's clearance range (or whole request), the
 * answer per pocket and the best clearance per fit class read from them. Kept after a newer test replaces
 * its calibration, so an older result can be made current again; goes with its printer profile.
 */
export const fitTests = pgTable(
  'fit_tests',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    printerProfileId: uuid()
      .notNull()
      .references(() => printerProfiles.id, { onDelete: 'cascade' }),
    material: text().$type<Material>().notNull(),
    joint: text().$type<'key' | 'dovetail'>().notNull(),
    coupon: jsonb().$type<FitTestCoupon>().notNull(),
    answers: jsonb().$type<FitTestAnswer[]>().notNull(),
    best: jsonb().$type<FitTestBest>().notNull(),
    notes: jsonb().$type<string[]>().notNull().default([]),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('fit_tests_profile_created_idx').on(t.printerProfileId, t.createdAt)],
);
