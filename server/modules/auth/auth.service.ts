import type { AppContext } from '../../app-context';
import type { ActiveSession } from '../../auth/sessions';
import { hashPassword, verifyDecoy, verifyPassword } from '../../auth/password';
import { AppError } from '../../errors/app-error';
import type { Me } from '../../../shared/schemas/account';
import { getMe } from '../accounts/account.service';
import { findUserByEmail, insertUser } from '../accounts/users.repository';
import { recordAuditInTeams } from '../audit/audit.service';
import { createTeamWithOwner, listMyTeams, personalTeamName } from '../teams/teams.service';
import { sendVerificationEmail } from './email-verification.service';
import { assertPasswordAllowed } from './password-policy';

const WRONG_CREDENTIALS = 'The e-mail address or the password is not right.';

/**
 * Creates the account and its personal team, mails the verification link and signs the new user
 * in at once. Input is already validated by the shared schema.
 */
export async function signUp(
  ctx: AppContext,
  input: { email: string; password: string; name: string },
): Promise<{ session: ActiveSession; me: Me }> {
  assertPasswordAllowed(input.password, 'password');
  const passwordHash = await hashPassword(input.password);
  const user = await ctx.db.transaction(async (tx) => {
    const created = await insertUser(tx, { email: input.email, name: input.name, passwordHash });
    if (!created) {
      throw new AppError('CONFLICT', 'An account with this e-mail address already exists. Sign in instead.', [
        { path: 'email', message: 'An account with this e-mail address already exists.' },
      ]);
    }
    await createTeamWithOwner(tx, created, personalTeamName(created.name), true);
    return created;
  });
  const session = await ctx.sessions.start(user.id);
  await sendVerificationEmail(ctx, user);
  return { session, me: await getMe(ctx.db, user) };
}

/**
 * Checks the credentials and starts a new session (a new id, never the one the browser had). The
 * error never says which of the two was wrong, and an unknown address costs as much time as a
 * wrong password.
 */
export async function signIn(
  ctx: AppContext,
  input: { email: string; password: string },
  previousSessionId: string | null,
): Promise<{ session: ActiveSession; me: Me }> {
  const user = await findUserByEmail(ctx.db, input.email);
  if (!user) {
    await verifyDecoy(input.password);
    throw new AppError('UNAUTHENTICATED', WRONG_CREDENTIALS);
  }
  if (!(await verifyPassword(user.passwordHash, input.password)))
    throw new AppError('UNAUTHENTICATED', WRONG_CREDENTIALS);
  if (previousSessionId) await ctx.sessions.end(previousSessionId);
  const session = await ctx.sessions.start(user.id);
  const teams = await listMyTeams(ctx.db, user.id);
  await recordAuditInTeams(
    ctx.db,
    teams.map((t) => t.id),
    user,
    'member.signed_in',
  );
  return { session, me: { user: { id: user.id, email: user.email, name: user.name }, teams } };
}
