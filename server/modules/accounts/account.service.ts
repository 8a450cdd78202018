import type { AppContext } from '../../app-context';
import type { Executor } from '../../db/executor';
import type { ActiveSession, SessionUser } from '../../auth/sessions';
import { hashPassword, verifyPassword } from '../../auth/password';
import { AppError } from '../../errors/app-error';
import type { Account, Me, UpdateAccountInput } from '../../../shared/schemas/account';
import { listMyTeams } from '../teams/teams.service';
import { assertPasswordAllowed } from '../auth/password-policy';
import { findUserById, setPasswordHash, setUnits, type UserRecord } from './users.repository';

/** The `GET /api/me` reply: who is signed in and their teams. */
export async function getMe(db: Executor, user: Pick<SessionUser, 'id' | 'email' | 'name'>): Promise<Me> {
  return { user: { id: user.id, email: user.email, name: user.name }, teams: await listMyTeams(db, user.id) };
}

const toAccount = (row: UserRecord): Account => ({
  id: row.id,
  email: row.email,
  name: row.name,
  emailVerified: row.emailVerifiedAt !== null,
  createdAt: row.createdAt.toISOString(),
  units: row.units,
});

/** The account's own details. */
export async function getAccount(ctx: AppContext, userId: string): Promise<Account> {
  const row = await findUserById(ctx.db, userId);
  if (!row) throw new AppError('UNAUTHENTICATED', 'Sign in to do this.');
  return toAccount(row);
}

/** Changes the account's preferences (the units lengths are shown and typed in) and returns the account. */
export async function updateAccount(ctx: AppContext, userId: string, input: UpdateAccountInput): Promise<Account> {
  const row = await setUnits(ctx.db, userId, input.units);
  if (!row) throw new AppError('UNAUTHENTICATED', 'Sign in to do this.');
  return toAccount(row);
}

/**
 * Changes the password after checking the current one, then signs out every other device (someone
 * changing a password may be locking out an intruder). This device stays signed in.
 */
export async function changePassword(
  ctx: AppContext,
  auth: { user: SessionUser; session: ActiveSession },
  input: { currentPassword: string; newPassword: string },
): Promise<void> {
  const row = await findUserById(ctx.db, auth.user.id);
  if (!row || !(await verifyPassword(row.passwordHash, input.currentPassword))) {
    throw new AppError('VALIDATION_FAILED', 'The current password is not right.', [
      { path: 'currentPassword', message: 'This is not your current password.' },
    ]);
  }
  assertPasswordAllowed(input.newPassword, 'newPassword');
  await setPasswordHash(ctx.db, row.id, await hashPassword(input.newPassword));
  await ctx.sessions.endOthersForUser(row.id, auth.session.id);
}
