import { randomUUID } from 'node:crypto';
import type { AuthRateLimits } from '../modules/auth/auth.routes';
import type { Env } from './env';

/** Settings of the account features that tests may override (shorter limits, a known app address). */
export interface AuthSettings {
  /** The browser's address of the app, for links in e-mails and the same-origin check. */
  appUrl: string;
  rateLimits: AuthRateLimits;
  /**
   * Names this deployment's rate-limit counters in the database: every process with the same scope shares
   * one allowance per client. Servers take it from RATE_LIMIT_SCOPE (default "seamwright").
   */
  rateLimitScope: string;
}

/** The account settings from the environment; `npm start` and `npm run dev` set APP_URL. */
export function authSettingsFromEnv(env: Env): AuthSettings {
  const windowMs = env.RATE_LIMIT_WINDOW_MINUTES * 60_000;
  return {
    appUrl: env.APP_URL ?? `http://${env.HOST}:${env.PORT}`,
    rateLimitScope: env.RATE_LIMIT_SCOPE,
    rateLimits: {
      signIn: { windowMs, limit: env.RATE_LIMIT_SIGN_IN },
      signUp: { windowMs, limit: env.RATE_LIMIT_SIGN_UP },
      reset: { windowMs, limit: env.RATE_LIMIT_RESET },
    },
  };
}

/**
 * Defaults for apps built without settings (API tests of other features). Their rate-limit scope is new for
 * every process, so test files running side by side never spend each other's allowance.
 */
export const defaultAuthSettings: AuthSettings = {
  appUrl: 'http://127.0.0.1:3000',
  rateLimitScope: `app-${randomUUID()}`,
  rateLimits: {
    signIn: { windowMs: 15 * 60_000, limit: 10 },
    signUp: { windowMs: 15 * 60_000, limit: 5 },
    reset: { windowMs: 15 * 60_000, limit: 5 },
  },
};
