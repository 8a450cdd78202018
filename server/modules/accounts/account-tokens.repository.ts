import { and, eq } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { accountTokens } from '../../db/schema';

export type TokenPurpose = (typeof accountTokens.purpose.enumValues)[number];

export async function insertAccountToken(
  db: Executor,
  values: { tokenHash: string; userId: string; purpose: TokenPurpose; email: string; expiresAt: Date },
): Promise<void> {
  await db.insert(accountTokens).values(values);
}

/**
 * Deletes the token and returns what it was for. Delete-and-return in one statement makes the
 * token single-use even when two requests race with it. Expiry is checked by the caller.
 */
export async function consumeAccountToken(
  db: Executor,
  tokenHash: string,
  purpose: TokenPurpose,
): Promise<{ userId: string; email: string; expiresAt: Date } | null> {
  const [row] = await db
    .delete(accountTokens)
    .where(and(eq(accountTokens.tokenHash, tokenHash), eq(accountTokens.purpose, purpose)))
    .returning({ userId: accountTokens.userId, email: accountTokens.email, expiresAt: accountTokens.expiresAt });
  return row ?? null;
}

/** Removes earlier links of one kind, so only the newest mailed link works. */
export async function deleteAccountTokens(db: Executor, userId: string, purpose: TokenPurpose): Promise<void> {
  await db.delete(accountTokens).where(and(eq(accountTokens.userId, userId), eq(accountTokens.purpose, purpose)));
}
