import type { RequestHandler } from 'express';
import { AppError } from '../errors/app-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

function originOf(value: string): string | null {
  try {
    return new URL(value).origin;
  } catch {
    return null;
  }
}

/**
 * Refuses state-changing requests sent by another site: the Origin header (or, when a browser
 * leaves it out, the Referer) must name this server or the configured app address. Requests with
 * neither come from scripts and tools, not from a page in a browser, so they pass — cookies with
 * SameSite=Lax already keep a cross-site form from carrying the session.
 */
export function sameOrigin(appUrl: string | undefined): RequestHandler {
  const configured = appUrl ? originOf(appUrl) : null;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    const referer = req.get('referer');
    const claimed = origin !== undefined ? origin : referer !== undefined ? originOf(referer) : undefined;
    if (claimed === undefined) return next();
    const own = `${req.protocol}://${req.get('host')}`;
    if (claimed !== null && (claimed === own || claimed === configured)) return next();
    next(new AppError('FORBIDDEN', 'This request came from another site and was refused.'));
  };
}
