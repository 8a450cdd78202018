import { and, eq, isNull, sql } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { users } from '../../db/schema';
import type { Units } from '../../../shared/schemas/account';

export interface UserRecord {
  id: string;
  email: string;
  name: string;
  passwordHash: string;
  emailVerifiedAt: Date | null;
  units: Units;
  createdAt: Date;
}

// Addresses are unique regardless of case (see the users table); look-ups match the same way.
const sameEmail = (email: string) => sql`lower(${users.email}) = lower(${email})`;

export async function findUserByEmail(db: Executor, email: string): Promise<UserRecord | null> {
  const [row] = await db.select().from(users).where(sameEmail(email)).limit(1);
  return row ?? null;
}

export async function findUserById(db: Executor, id: string): Promise<UserRecord | null> {
  const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
  return row ?? null;
}

/** Inserts a user; null when the address is already taken (the unique index decides, race-free). */
export async function insertUser(
  db: Executor,
  values: { email: string; name: string; passwordHash: string },
): Promise<UserRecord | null> {
  const [row] = await db.insert(users).values(values).onConflictDoNothing().returning();
  return row ?? null;
}

export async function setPasswordHash(db: Executor, userId: string, passwordHash: string): Promise<void> {
  await db.update(users).set({ passwordHash }).where(eq(users.id, userId));
}

/** Sets the account's units; null when there is no such user (deleted meanwhile). */
export async function setUnits(db: Executor, userId: string, units: Units): Promise<UserRecord | null> {
  const [row] = await db.update(users).set({ units }).where(eq(users.id, userId)).returning();
  return row ?? null;
}

/** Marks the address verified if it is still the one the link was sent to. */
export async function markEmailVerified(db: Executor, userId: string, email: string): Promise<boolean> {
  const rows = await db
    .update(users)
    .set({ emailVerifiedAt: new Date() })
    .where(and(eq(users.id, userId), sameEmail(email), isNull(users.emailVerifiedAt)))
    .returning({ id: users.id });
  return rows.length > 0;
}
