import type { Request } from 'express';
import { AppError } from '../errors/app-error';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * A uuid route parameter. Anything else answers 404 like an unknown id does: a malformed id names
 * nothing, and the database would otherwise reject it with a 500.
 */
export function uuidParam(req: Request, name: string, what: string): string {
  const value = req.params[name];
  if (typeof value !== 'string' || !UUID.test(value)) throw new AppError('NOT_FOUND', `There is no such ${what}.`);
  return value.toLowerCase();
}
