import { afterAll } from 'vitest';
import { pino } from 'pino';
import { createApp } from '../../server/app';
import { createDatabase } from '../../server/db/client';

/** The real app on the real, migrated test database; the pool closes after the file's tests. */
export function useTestApp() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('API tests need DATABASE_URL: run them with `npm test`.');
  const { db, pool } = createDatabase(url);
  afterAll(() => pool.end());
  const app = createApp({ db, logger: pino({ level: 'silent' }) });
  return { app, db, pool };
}
