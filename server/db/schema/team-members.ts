import { index, pgEnum, pgTable, primaryKey, timestamp, uuid } from 'drizzle-orm/pg-core';
import { teams } from './teams';
import { users } from './users';

/** The three roles, strongest first; shared/schemas/team.ts holds the same list for the API. */
export const teamRole = pgEnum('team_role', ['owner', 'editor', 'viewer']);

/** Who belongs to which team, in which role. A team keeps at least one owner (enforced by the service). */
export const teamMembers = pgTable(
  'team_members',
  {
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: teamRole().notNull(),
    joinedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.teamId, t.userId] }), index('team_members_user_id_idx').on(t.userId)],
);
