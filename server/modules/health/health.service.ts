import type { Database } from '../../db/client';
import { pingDatabase } from './health.repository';

export interface Health {
  status: 'ok' | 'degraded';
  db: 'ok' | 'down';
}

// A health probe must answer quickly even when the database hangs.
const PING_TIMEOUT_MS = 2_000;

/** Reports whether the server can reach its database. */
export async function checkHealth(db: Database): Promise<Health> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error('database ping timed out')), PING_TIMEOUT_MS);
  });
  try {
    await Promise.race([pingDatabase(db), timeout]);
    return { status: 'ok', db: 'ok' };
  } catch {
    return { status: 'degraded', db: 'down' };
  } finally {
    clearTimeout(timer);
  }
}
