// The one session module: everything about sign-in sessions (storage, expiry, cookies) lives
// here, and only this file imports the session library. Lucia v3 is no longer developed
// upstream; replacing it means rewriting this file and nothing else.
import type { Response } from 'express';
import { Lucia, TimeSpan } from 'lucia';
import { DrizzlePostgreSQLAdapter } from '@lucia-auth/adapter-drizzle';
import type { Database } from '../db/client';
import { sessions, users } from '../db/schema';

/** The signed-in person as the request sees them. */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
  emailVerified: boolean;
}

/** A live session; `fresh` means its expiry just moved and the cookie must be sent again. */
export interface ActiveSession {
  id: string;
  userId: string;
  expiresAt: Date;
  fresh: boolean;
}

export interface Sessions {
  /** Starts a new session with a new random id (never reuses one: no session fixation). */
  start(userId: string): Promise<ActiveSession>;
  /** The session and its user, or null when unknown or expired; extends the expiry when half used. */
  validate(sessionId: string): Promise<{ session: ActiveSession; user: SessionUser } | null>;
  end(sessionId: string): Promise<void>;
  endAllForUser(userId: string): Promise<void>;
  endOthersForUser(userId: string, keepSessionId: string): Promise<void>;
  /** Deletes expired rows; safe to run at any time. */
  sweepExpired(): Promise<void>;
}

export const SESSION_COOKIE = 'seamwright_session';
// Sliding expiry: a session lasts 30 days from its last use (renewed once half of it has passed).
const SESSION_LIFETIME = new TimeSpan(30, 'd');

function createLucia(db: Database) {
  return new Lucia(new DrizzlePostgreSQLAdapter(db, sessions, users), {
    sessionExpiresIn: SESSION_LIFETIME,
    sessionCookie: { name: SESSION_COOKIE },
    getUserAttributes: (row) => ({ email: row.email, name: row.name, emailVerified: row.emailVerifiedAt !== null }),
  });
}

declare module 'lucia' {
  interface Register {
    Lucia: ReturnType<typeof createLucia>;
    DatabaseUserAttributes: { email: string; name: string; emailVerifiedAt: Date | null };
  }
}

/** Session storage in PostgreSQL through the session library's Drizzle adapter. */
export function createSessions(db: Database): Sessions {
  const lucia = createLucia(db);
  return {
    async start(userId) {
      const s = await lucia.createSession(userId, {});
      return { id: s.id, userId: s.userId, expiresAt: s.expiresAt, fresh: true };
    },
    async validate(sessionId) {
      const { session, user } = await lucia.validateSession(sessionId);
      if (!session) return null;
      return {
        session: { id: session.id, userId: session.userId, expiresAt: session.expiresAt, fresh: session.fresh },
        user: { id: user.id, email: user.email, name: user.name, emailVerified: user.emailVerified },
      };
    },
    end: (sessionId) => lucia.invalidateSession(sessionId),
    endAllForUser: (userId) => lucia.invalidateUserSessions(userId),
    async endOthersForUser(userId, keepSessionId) {
      const all = await lucia.getUserSessions(userId);
      await Promise.all(all.filter((s) => s.id !== keepSessionId).map((s) => lucia.invalidateSession(s.id)));
    },
    sweepExpired: () => lucia.deleteExpiredSessions(),
  };
}

/** The session id from a Cookie header, or null. */
export function readSessionCookie(cookieHeader: string | undefined): string | null {
  if (!cookieHeader) return null;
  for (const part of cookieHeader.split(';')) {
    const [name, ...rest] = part.trim().split('=');
    if (name !== SESSION_COOKIE) continue;
    // A cookie mangled by hand or by a proxy (a broken %-escape) is no session, not an error.
    try {
      return decodeURIComponent(rest.join('=')) || null;
    } catch {
      return null;
    }
  }
  return null;
}

// HttpOnly: scripts cannot read it. SameSite=Lax: not sent on cross-site POSTs. Secure over HTTPS.
const cookieOptions = (secure: boolean) => ({ httpOnly: true, sameSite: 'lax' as const, secure, path: '/' });

/** Sends the session cookie, expiring with the session. */
export function writeSessionCookie(res: Response, session: ActiveSession, secure: boolean): void {
  res.cookie(SESSION_COOKIE, session.id, { ...cookieOptions(secure), expires: session.expiresAt });
}

/** Tells the browser to forget the session cookie. */
export function clearSessionCookie(res: Response, secure: boolean): void {
  res.clearCookie(SESSION_COOKIE, cookieOptions(secure));
}
