import { and, eq } from 'drizzle-orm';
import type { Database } from '../client';
import { teamMembers, teams, users } from '../schema';
import { hashPassword } from '../../auth/password';
import { insertMember } from '../../modules/teams/teams.repository';
import { createTeamWithOwner, personalTeamName } from '../../modules/teams/teams.service';
import { demoPassword, demoPeople, demoStudio } from './demo-scenario';
import { seedTeamLibrary } from './seed-team-library';
import type { SessionUser } from '../../auth/sessions';
import type { Role } from '../../../shared/schemas/team';

/** Inserts the demo scenario; running it again changes nothing (idempotent by natural keys). */
export async function seedDemoData(db: Database): Promise<void> {
  await db.transaction(async (tx) => {
    const ids: string[] = [];
    for (const person of demoPeople) ids.push(await ensurePerson(tx, person));
    const ownerId = ids[demoPeople.findIndex((p) => p.role === 'owner')];
    if (!ownerId) throw new Error('the demo scenario needs an owner');
    const teamId = await ensureStudio(tx, ownerId);
    for (const [i, person] of demoPeople.entries()) {
      await insertMember(tx, { teamId, userId: ids[i] as string, role: person.role });
    }
    await seedTeamLibrary(tx, teamId, {
      owner: await sessionUser(tx, 'owner', ids),
      editor: await sessionUser(tx, 'editor', ids),
    });
  });
}

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

// The demo person of a role as a signed-in user, for the library seed's versions and history.
async function sessionUser(tx: Tx, role: Role, ids: string[]): Promise<SessionUser> {
  const id = ids[demoPeople.findIndex((p) => p.role === role)] as string;
  const [u] = await tx.select().from(users).where(eq(users.id, id));
  if (!u) throw new Error(`demo ${role} vanished`);
  return { id: u.id, email: u.email, name: u.name, emailVerified: u.emailVerifiedAt !== null };
}

// A demo person exists like a real one: verified address, personal team.
async function ensurePerson(tx: Tx, person: { name: string; email: string }): Promise<string> {
  const [found] = await tx.select({ id: users.id }).from(users).where(eq(users.email, person.email));
  if (found) return found.id;
  const passwordHash = await hashPassword(demoPassword);
  const [created] = await tx
    .insert(users)
    .values({ ...person, passwordHash, emailVerifiedAt: new Date() })
    .returning();
  if (!created) throw new Error(`could not create demo user ${person.email}`);
  await createTeamWithOwner(tx, created, personalTeamName(person.name), true);
  return created.id;
}

async function ensureStudio(tx: Tx, ownerId: string): Promise<string> {
  const [found] = await tx
    .select({ id: teams.id })
    .from(teams)
    .innerJoin(teamMembers, eq(teamMembers.teamId, teams.id))
    .where(and(eq(teams.name, demoStudio.name), eq(teamMembers.userId, ownerId)));
  if (found) return found.id;
  const [owner] = await tx.select().from(users).where(eq(users.id, ownerId));
  if (!owner) throw new Error('demo owner vanished');
  return (await createTeamWithOwner(tx, owner, demoStudio.name, false)).id;
}
