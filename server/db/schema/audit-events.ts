import { bigserial, index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { teams } from './teams';
import { users } from './users';

/**
 * The team's audit log: who did what, when. `actorEmail` and `subject` are copied at the time so
 * the entry still reads correctly after the people involved leave or delete their accounts.
 */
export const auditEvents = pgTable(
  'audit_events',
  {
    id: bigserial({ mode: 'number' }).primaryKey(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    actorId: uuid().references(() => users.id, { onDelete: 'set null' }),
    actorEmail: text(),
    action: text().notNull(),
    subject: text().notNull().default(''),
    detail: jsonb().$type<Record<string, string>>().notNull().default({}),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('audit_events_team_created_idx').on(t.teamId, t.createdAt)],
);
