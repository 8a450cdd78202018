import { and, desc, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { invitations, teams, users } from '../../db/schema';
import type { Role } from '../../../shared/schemas/team';

// Pending: neither accepted nor revoked, and not yet expired.
const pending = () =>
  and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, sql`now()`));

export async function insertInvitation(
  db: Executor,
  values: { teamId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date },
) {
  const [row] = await db.insert(invitations).values(values).returning();
  if (!row) throw new Error('insert into invitations returned nothing');
  return row;
}

export function listPendingInvitations(db: Executor, teamId: string) {
  return db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      invitedBy: users.name,
      expiresAt: invitations.expiresAt,
      createdAt: invitations.createdAt,
    })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.teamId, teamId), pending()))
    .orderBy(desc(invitations.createdAt));
}

/** Revokes the team's pending invitations for one address (a new one replaces them). */
export async function revokePendingForEmail(db: Executor, teamId: string, email: string): Promise<void> {
  await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.teamId, teamId), sql`lower(${invitations.email}) = lower(${email})`, pending()));
}

/** Revokes one pending invitation of the team; returns its address, or null when there is none. */
export async function revokeInvitation(db: Executor, teamId: string, id: string): Promise<string | null> {
  const [row] = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.teamId, teamId), eq(invitations.id, id), pending()))
    .returning({ email: invitations.email });
  return row?.email ?? null;
}

/** A pending invitation by its token's hash, with team and inviter names; `lock` holds it for the transaction. */
export async function findPendingByTokenHash(db: Executor, tokenHash: string, lock = false) {
  const query = db
    .select({
      id: invitations.id,
      teamId: invitations.teamId,
      teamName: teams.name,
      email: invitations.email,
      role: invitations.role,
      invitedBy: users.name,
      expiresAt: invitations.expiresAt,
    })
    .from(invitations)
    .innerJoin(teams, eq(teams.id, invitations.teamId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(and(eq(invitations.tokenHash, tokenHash), pending()))
    .limit(1);
  const [row] = lock ? await query.for('update', { of: invitations }) : await query;
  return row ?? null;
}

export async function markInvitationAccepted(db: Executor, id: string): Promise<void> {
  await db.update(invitations).set({ acceptedAt: new Date() }).where(eq(invitations.id, id));
}
