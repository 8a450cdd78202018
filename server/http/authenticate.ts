import type { RequestHandler } from 'express';
import { clearSessionCookie, readSessionCookie, writeSessionCookie, type Sessions } from '../auth/sessions';
import type { ActiveSession, SessionUser } from '../auth/sessions';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** The signed-in user and session, or null for an anonymous request. Set by `authenticate`. */
      auth: { user: SessionUser; session: ActiveSession } | null;
    }
  }
}

/**
 * Reads the session cookie on every API request. A session past half its life is renewed and the
 * cookie sent again (sliding expiry); an unknown or expired one has its cookie cleared.
 */
export function authenticate(sessions: Sessions): RequestHandler {
  return async (req, res, next) => {
    req.auth = null;
    const sessionId = readSessionCookie(req.headers.cookie);
    if (!sessionId) return next();
    const found = await sessions.validate(sessionId);
    if (!found) {
      clearSessionCookie(res, req.secure);
      return next();
    }
    if (found.session.fresh) writeSessionCookie(res, found.session, req.secure);
    req.auth = found;
    next();
  };
}
