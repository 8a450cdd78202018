import { AppError } from './app-error';

/** What a 503 says while PostgreSQL cannot be reached. */
export const DATABASE_DOWN_MESSAGE =
  'The database is not answering right now; nothing was saved. Please try again in a moment.';

// Socket-level failures of the connection to PostgreSQL (refused, reset, timed out, host gone).
const NETWORK_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'ENOTFOUND',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'EAI_AGAIN',
]);
// SQLSTATE of a server that is shutting down, restarting or refusing new sessions for now:
// 57P01 admin_shutdown, 57P02 crash_shutdown, 57P03 cannot_connect_now, 53300 too_many_connections.
const UNAVAILABLE_STATES = new Set(['57P01', '57P02', '57P03', '53300']);
// What node-postgres and its pool say when the connection is lost or cannot be made in time.
const CONNECTION_MESSAGES =
  /^(Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error|Client was closed and is not queryable|Query read timeout|timeout expired)/;

type Failure = { code?: unknown; message?: unknown; cause?: unknown; errors?: unknown };

/** The error and every error behind it (Drizzle wraps the driver's error in `cause`; sockets in AggregateError). */
function chainOf(err: unknown): Failure[] {
  const out: Failure[] = [];
  const queue: unknown[] = [err];
  while (queue.length > 0 && out.length < 12) {
    const next = queue.shift();
    if (typeof next !== 'object' || next === null) continue;
    const failure = next as Failure;
    out.push(failure);
    queue.push(failure.cause);
    if (Array.isArray(failure.errors)) queue.push(...failure.errors);
  }
  return out;
}

function isUnavailable(f: Failure): boolean {
  const code = typeof f.code === 'string' ? f.code : '';
  if (NETWORK_CODES.has(code) || UNAVAILABLE_STATES.has(code) || /^08[0-9A-Z]{3}$/.test(code)) return true;
  return typeof f.message === 'string' && CONNECTION_MESSAGES.test(f.message);
}

/**
 * True when `err` (or what it wraps) says PostgreSQL cannot be reached: a refused, reset or timed-out
 * connection, the pool's connect timeout, a server shutting down (57P01–57P03) or a connection exception
 * (class 08).
 */
export function isDatabaseUnavailable(err: unknown): boolean {
  return chainOf(err).some(isUnavailable);
}

/**
 * Maps a PostgreSQL failure to the closed list: the database out of reach → 503 SERVICE_UNAVAILABLE; a
 * data exception (SQLSTATE class 22: a NUL character in text, a number out of range, malformed input for a
 * type) → 400, since only the request's values can cause it. Anything else → null (a 500 for the caller).
 */
export function fromPostgres(err: unknown): AppError | null {
  if (isDatabaseUnavailable(err)) return new AppError('SERVICE_UNAVAILABLE', DATABASE_DOWN_MESSAGE);
  const dataException = chainOf(err).find((f) => typeof f.code === 'string' && /^22[0-9A-Z]{3}$/.test(f.code));
  if (dataException) {
    return new AppError(
      'BAD_REQUEST',
      'The request holds a value that cannot be stored (a control character, or a number out of range). Nothing was saved.',
    );
  }
  return null;
}
