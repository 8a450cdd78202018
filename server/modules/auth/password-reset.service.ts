import type { AppContext } from '../../app-context';
import { hashPassword } from '../../auth/password';
import { hashLinkToken, newLinkToken } from '../../auth/tokens';
import { AppError } from '../../errors/app-error';
import { passwordResetMail } from '../../mail/messages/password-reset';
import { consumeAccountToken, deleteAccountTokens, insertAccountToken } from '../accounts/account-tokens.repository';
import { findUserByEmail, markEmailVerified, setPasswordHash } from '../accounts/users.repository';
import { assertPasswordAllowed } from './password-policy';

/** How long a reset link works: one hour. */
export const RESET_LINK_LIFETIME_MS = 60 * 60 * 1000;

/**
 * Starts a reset. The caller answers the same whether or not the address has an account, and the
 * token and mail work runs after the answer, so its timing gives nothing away either.
 */
export async function requestPasswordReset(ctx: AppContext, email: string): Promise<void> {
  const user = await findUserByEmail(ctx.db, email);
  if (!user) return;
  void (async () => {
    const token = newLinkToken();
    await deleteAccountTokens(ctx.db, user.id, 'reset-password');
    await insertAccountToken(ctx.db, {
      tokenHash: hashLinkToken(token),
      userId: user.id,
      purpose: 'reset-password',
      email: user.email,
      expiresAt: new Date(Date.now() + RESET_LINK_LIFETIME_MS),
    });
    await ctx.mailer.send(passwordResetMail(user.email, user.name, ctx.links.resetPassword(token)));
  })().catch((error: unknown) => ctx.logger.error({ err: error }, 'the reset e-mail could not be sent'));
}

/**
 * Sets a new password from a reset link and signs the account out everywhere. Using the link also
 * proves the address, so an unconfirmed address becomes confirmed.
 */
export async function resetPassword(ctx: AppContext, token: string, password: string): Promise<void> {
  assertPasswordAllowed(password, 'password');
  const found = await consumeAccountToken(ctx.db, hashLinkToken(token), 'reset-password');
  if (!found || found.expiresAt.getTime() <= Date.now()) {
    throw new AppError('BAD_REQUEST', 'This reset link has expired or was already used. Ask for a new one.');
  }
  await setPasswordHash(ctx.db, found.userId, await hashPassword(password));
  await markEmailVerified(ctx.db, found.userId, found.email);
  await ctx.sessions.endAllForUser(found.userId);
}
