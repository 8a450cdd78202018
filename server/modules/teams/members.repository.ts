import { and, asc, count, eq, sql } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { teamMembers, users } from '../../db/schema';
import type { Role } from '../../../shared/schemas/team';

export interface MemberRecord {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: Date;
}

const memberColumns = {
  userId: teamMembers.userId,
  name: users.name,
  email: users.email,
  role: teamMembers.role,
  joinedAt: teamMembers.joinedAt,
};

export function listMembers(db: Executor, teamId: string): Promise<MemberRecord[]> {
  return db
    .select(memberColumns)
    .from(teamMembers)
    .innerJoin(users, eq(users.id, teamMembers.userId))
    .where(eq(teamMembers.teamId, teamId))
    .orderBy(asc(teamMembers.joinedAt), asc(users.name));
}

export async function findMember(db: Executor, teamId: string, userId: string): Promise<MemberRecord | null> {
  const [row] = await db
    .select(memberColumns)
    .from(teamMembers)
    .innerJoin(users, eq(users.id, teamMembers.userId))
    .where(and(eq(teamMembers.teamId, teamId), eq(teamMembers.userId, userId)))
    .limit(1);
  return row ?? null;
}

export async function countOwners(db: Executor, teamId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(teamMembers)
    .where(and(eq(teamMembers.teamId, teamId), eq(teamMembers.role, 'owner')));
  return row?.n ?? 0;
}

export async function updateMemberRole(db: Executor, teamId: string, userId: string, role: Role): Promise<void> {
  await db
    .update(teamMembers)
    .set({ role })
    .where(and(eq(teamMembers.teamId, teamId), eq(teamMembers.userId, userId)));
}

export async function deleteMember(db: Executor, teamId: string, userId: string): Promise<void> {
  await db.delete(teamMembers).where(and(eq(teamMembers.teamId, teamId), eq(teamMembers.userId, userId)));
}

/** The member with this address (compared without case), or null. */
export async function findMemberByEmail(db: Executor, teamId: string, email: string): Promise<MemberRecord | null> {
  const [row] = await db
    .select(memberColumns)
    .from(teamMembers)
    .innerJoin(users, eq(users.id, teamMembers.userId))
    .where(and(eq(teamMembers.teamId, teamId), sql`lower(${users.email}) = lower(${email})`))
    .limit(1);
  return row ?? null;
}
