import type { RequestHandler } from 'express';
import { rateLimit, type Store } from 'express-rate-limit';
import { AppError } from '../errors/app-error';

export interface RateLimitSettings {
  windowMs: number;
  /** Attempts per window per client address. */
  limit: number;
}

/**
 * A per-address limit for one family of routes (sign-in, sign-up, reset). Past it the request is
 * answered 429 in the usual error shape, with Retry-After in seconds. The counts live in `store`, shared by
 * every server process on the database; when the store cannot answer, the request fails (503 while the
 * database is down) rather than slipping past the limit.
 */
export function limitRate(what: string, { windowMs, limit }: RateLimitSettings, store: Store): RequestHandler {
  return rateLimit({
    windowMs,
    limit,
    store,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: (req, res, next) => {
      const resetTime = (req as { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
      const seconds = resetTime ? Math.max(1, Math.ceil((resetTime.getTime() - Date.now()) / 1000)) : 60;
      res.setHeader('Retry-After', String(seconds));
      const minutes = Math.ceil(seconds / 60);
      next(
        new AppError(
          'RATE_LIMITED',
          `Too many ${what} attempts from here. Please wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again.`,
        ),
      );
    },
  });
}
