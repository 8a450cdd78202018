import type { Request, RequestHandler } from 'express';
import {
  SESSION_COOKIE,
  clearSessionCookie,
  readSessionCookie,
  writeSessionCookie,
  type Sessions,
} from '../auth/sessions';
import type { ActiveSession, SessionUser } from '../auth/sessions';
import { AppError } from '../errors/app-error';
import { DATABASE_DOWN_MESSAGE, isDatabaseUnavailable } from '../errors/from-postgres';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** The signed-in user and session, or null for an anonymous request. Set by `authenticate`. */
      auth: { user: SessionUser; session: ActiveSession } | null;
    }
  }
}

// Session ids are random URL-safe letters and digits; anything else (a broken %-escape, a NUL once
// decoded, far too long) was never issued by this server.
const SESSION_ID = /^[A-Za-z0-9_-]{1,255}$/;
const NAMED = new RegExp(`(?:^|;)\\s*${SESSION_COOKIE}=`);

/** The session id of the cookie header: null when there is none, 'malformed' when it cannot be one. */
function sessionIdOf(header: string | undefined): string | null | 'malformed' {
  let id: string | null;
  try {
    id = readSessionCookie(header);
  } catch {
    return 'malformed'; // a %-escape decodeURIComponent refuses
  }
  // An empty value ("seamwright_session=") reads as none, but the browser should still forget it.
  if (id === null) return header && NAMED.test(header) ? 'malformed' : null;
  return SESSION_ID.test(id) ? id : 'malformed';
}

/** Drops the session cookie from the request's own Cookie header, so later readers see no session either. */
function forgetSessionCookie(req: Request): void {
  const rest = (req.headers.cookie ?? '')
    .split(';')
    .filter((part) => part.split('=')[0]?.trim() !== SESSION_COOKIE)
    .join(';');
  if (rest.trim() === '') delete req.headers.cookie;
  else req.headers.cookie = rest;
}

/**
 * While the database is down the session cannot be checked. The request goes on, so routes that need
 * no account (kit and coupon downloads, health) still answer; reading `req.auth` (every route that needs
 * the account does) throws the 503. The cookie is kept: the session is probably fine.
 */
function deferUnavailable(req: Request): void {
  Object.defineProperty(req, 'auth', {
    configurable: true,
    enumerable: false,
    get() {
      throw new AppError('SERVICE_UNAVAILABLE', DATABASE_DOWN_MESSAGE);
    },
  });
}

/**
 * Reads the session cookie on every API request. A session past half its life is renewed and the
 * cookie sent again (sliding expiry); an unknown or expired one, or a cookie that cannot be a session id,
 * has its cookie cleared and the request goes on signed out.
 */
export function authenticate(sessions: Sessions): RequestHandler {
  return async (req, res, next) => {
    req.auth = null;
    const sessionId = sessionIdOf(req.headers.cookie);
    if (sessionId === null) return next();
    if (sessionId === 'malformed') {
      forgetSessionCookie(req);
      clearSessionCookie(res, req.secure);
      return next();
    }
    let found: Awaited<ReturnType<Sessions['validate']>>;
    try {
      found = await sessions.validate(sessionId);
    } catch (error) {
      if (!isDatabaseUnavailable(error)) throw error;
      deferUnavailable(req);
      return next();
    }
    if (!found) {
      clearSessionCookie(res, req.secure);
      return next();
    }
    if (found.session.fresh) writeSessionCookie(res, found.session, req.secure);
    req.auth = found;
    next();
  };
}
