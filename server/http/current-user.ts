import type { Request } from 'express';
import { AppError } from '../errors/app-error';
import type { ActiveSession, SessionUser } from '../auth/sessions';

/** The signed-in user, or a 401 for anonymous requests. */
export function requireUser(req: Request): SessionUser {
  if (!req.auth) throw new AppError('UNAUTHENTICATED', 'Sign in to do this.');
  return req.auth.user;
}

/** The signed-in user and their current session, or a 401. */
export function requireSession(req: Request): { user: SessionUser; session: ActiveSession } {
  if (!req.auth) throw new AppError('UNAUTHENTICATED', 'Sign in to do this.');
  return req.auth;
}
