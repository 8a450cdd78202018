import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { hashLinkToken, newLinkToken } from '../../auth/tokens';
import { AppError } from '../../errors/app-error';
import { verifyEmailMail } from '../../mail/messages/verify-email';
import { consumeAccountToken, deleteAccountTokens, insertAccountToken } from '../accounts/account-tokens.repository';
import { markEmailVerified } from '../accounts/users.repository';

/** How long a verification link works. */
export const VERIFY_LINK_LIFETIME_MS = 48 * 60 * 60 * 1000;

/** Mails a fresh verification link (older links stop working). Mail trouble is logged, not thrown. */
export async function sendVerificationEmail(
  ctx: AppContext,
  user: Pick<SessionUser, 'id' | 'email' | 'name'>,
): Promise<void> {
  const token = newLinkToken();
  await deleteAccountTokens(ctx.db, user.id, 'verify-email');
  await insertAccountToken(ctx.db, {
    tokenHash: hashLinkToken(token),
    userId: user.id,
    purpose: 'verify-email',
    email: user.email,
    expiresAt: new Date(Date.now() + VERIFY_LINK_LIFETIME_MS),
  });
  await ctx.mailer
    .send(verifyEmailMail(user.email, user.name, ctx.links.verifyEmail(token)))
    .catch((error: unknown) => ctx.logger.error({ err: error }, 'the verification e-mail could not be sent'));
}

/** Sends the link again, unless the address is already confirmed. */
export async function resendVerification(ctx: AppContext, user: SessionUser): Promise<void> {
  if (!user.emailVerified) await sendVerificationEmail(ctx, user);
}

/** Confirms the address a link was sent to; the link works once and only before it expires. */
export async function verifyEmail(ctx: AppContext, token: string): Promise<void> {
  const found = await consumeAccountToken(ctx.db, hashLinkToken(token), 'verify-email');
  if (!found || found.expiresAt.getTime() <= Date.now()) {
    throw new AppError('BAD_REQUEST', 'This confirmation link has expired or was already used. Ask for a new one.');
  }
  await markEmailVerified(ctx.db, found.userId, found.email);
}
