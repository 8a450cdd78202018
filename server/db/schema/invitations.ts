import { index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { teamRole } from './team-members';
import { teams } from './teams';
import { users } from './users';

/**
 * An owner's invitation of an e-mail address into a team. Only the SHA-256 of the link's token is
 * stored, so a leaked database cannot be used to join teams. Pending = not accepted, not revoked,
 * not expired.
 */
export const invitations = pgTable(
  'invitations',
  {
    id: uuid().primaryKey().defaultRandom(),
    teamId: uuid()
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    email: text().notNull(),
    role: teamRole().notNull(),
    tokenHash: text().notNull().unique(),
    invitedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    acceptedAt: timestamp({ withTimezone: true }),
    revokedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('invitations_team_id_idx').on(t.teamId)],
);
