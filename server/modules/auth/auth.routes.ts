import { Router, type Request } from 'express';
import type { AppContext } from '../../app-context';
import { clearSessionCookie, readSessionCookie, writeSessionCookie } from '../../auth/sessions';
import { requireSession, requireUser } from '../../http/current-user';
import { parseWith } from '../../http/parse';
import { limitRate, type RateLimitSettings } from '../../http/rate-limit';
import { PostgresRateLimitStore } from '../rate-limits/postgres-rate-limit-store';
import {
  resetConfirmSchema,
  resetRequestSchema,
  signInSchema,
  signUpSchema,
  verifyEmailSchema,
} from '../../../shared/schemas/auth';
import { signIn, signUp } from './auth.service';
import { resendVerification, verifyEmail } from './email-verification.service';
import { requestPasswordReset, resetPassword } from './password-reset.service';

export interface AuthRateLimits {
  signIn: RateLimitSettings;
  signUp: RateLimitSettings;
  reset: RateLimitSettings;
}

/** The limits and the database scope their counters live under (see AuthSettings.rateLimitScope). */
export interface AuthRateLimitConfig {
  limits: AuthRateLimits;
  scope: string;
}

const RESET_ANSWER = 'If an account uses this address, we have sent it a link to choose a new password.';

/**
 * POST /api/auth/sign-up · sign-in · sign-out · sign-out-everywhere · verify-email ·
 * resend-verification · password-reset/request · password-reset/confirm. Sign-in, sign-up and the
 * mail-sending routes are rate-limited per client address.
 */
export function authRoutes(ctx: AppContext, { limits, scope }: AuthRateLimitConfig): Router {
  const router = Router();
  const secure = (req: Request) => req.secure;
  const limit = (what: string, family: string, settings: RateLimitSettings) =>
    limitRate(what, settings, new PostgresRateLimitStore(ctx.db, scope, family));
  const resetLimit = limit('password reset', 'reset', limits.reset);

  router.post('/auth/sign-up', limit('sign-up', 'sign-up', limits.signUp), async (req, res) => {
    const { session, me } = await signUp(ctx, parseWith(signUpSchema, req.body));
    writeSessionCookie(res, session, secure(req));
    res.status(201).json(me);
  });
  router.post('/auth/sign-in', limit('sign-in', 'sign-in', limits.signIn), async (req, res) => {
    const input = parseWith(signInSchema, req.body);
    const { session, me } = await signIn(ctx, input, readSessionCookie(req.headers.cookie));
    writeSessionCookie(res, session, secure(req));
    res.json(me);
  });
  router.post('/auth/sign-out', async (req, res) => {
    if (req.auth) await ctx.sessions.end(req.auth.session.id);
    clearSessionCookie(res, secure(req));
    res.status(204).end();
  });
  router.post('/auth/sign-out-everywhere', async (req, res) => {
    await ctx.sessions.endAllForUser(requireSession(req).user.id);
    clearSessionCookie(res, secure(req));
    res.status(204).end();
  });
  router.post('/auth/verify-email', async (req, res) => {
    await verifyEmail(ctx, parseWith(verifyEmailSchema, req.body).token);
    res.json({ verified: true });
  });
  router.post('/auth/resend-verification', limit('confirmation e-mail', 'resend', limits.reset), async (req, res) => {
    await resendVerification(ctx, requireUser(req));
    res.status(204).end();
  });
  router.post('/auth/password-reset/request', resetLimit, async (req, res) => {
    await requestPasswordReset(ctx, parseWith(resetRequestSchema, req.body).email);
    res.status(202).json({ message: RESET_ANSWER });
  });
  router.post('/auth/password-reset/confirm', resetLimit, async (req, res) => {
    const { token, password } = parseWith(resetConfirmSchema, req.body);
    await resetPassword(ctx, token, password);
    clearSessionCookie(res, secure(req));
    res.status(204).end();
  });
  return router;
}
