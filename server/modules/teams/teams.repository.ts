import { and, asc, desc, eq, sql } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { teamMembers, teams } from '../../db/schema';
import type { Role } from '../../../shared/schemas/team';

/** A team seen by one of its members. */
export interface MemberTeam {
  id: string;
  name: string;
  personal: boolean;
  createdAt: Date;
  role: Role;
}

const memberTeamColumns = {
  id: teams.id,
  name: teams.name,
  personal: teams.personal,
  createdAt: teams.createdAt,
  role: teamMembers.role,
};

export async function insertTeam(db: Executor, values: { name: string; personal: boolean }) {
  const [row] = await db.insert(teams).values(values).returning();
  if (!row) throw new Error('insert into teams returned nothing');
  return row;
}

/** Adds a member; false when they already belong to the team (their role is left as it is). */
export async function insertMember(
  db: Executor,
  values: { teamId: string; userId: string; role: Role },
): Promise<boolean> {
  const rows = await db.insert(teamMembers).values(values).onConflictDoNothing().returning({ role: teamMembers.role });
  return rows.length > 0;
}

/** The user's teams: the personal team first, then by name. */
export function listTeamsOfUser(db: Executor, userId: string): Promise<MemberTeam[]> {
  return db
    .select(memberTeamColumns)
    .from(teamMembers)
    .innerJoin(teams, eq(teams.id, teamMembers.teamId))
    .where(eq(teamMembers.userId, userId))
    .orderBy(desc(teams.personal), asc(teams.name), asc(teams.createdAt));
}

/** The team as `userId` sees it, or null when they are not a member (or it does not exist). */
export async function findTeamOfMember(db: Executor, teamId: string, userId: string): Promise<MemberTeam | null> {
  const [row] = await db
    .select(memberTeamColumns)
    .from(teamMembers)
    .innerJoin(teams, eq(teams.id, teamMembers.teamId))
    .where(and(eq(teamMembers.teamId, teamId), eq(teamMembers.userId, userId)))
    .limit(1);
  return row ?? null;
}

/** Locks the team row until the transaction ends, so concurrent role changes queue up. */
export async function lockTeam(db: Executor, teamId: string): Promise<void> {
  await db.execute(sql`select 1 from ${teams} where ${teams.id} = ${teamId} for update`);
}

export async function renameTeam(db: Executor, teamId: string, name: string): Promise<void> {
  await db.update(teams).set({ name }).where(eq(teams.id, teamId));
}

export async function deleteTeam(db: Executor, teamId: string): Promise<void> {
  await db.delete(teams).where(eq(teams.id, teamId));
}
