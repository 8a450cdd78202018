import { hostname } from 'node:os';
import type { Database } from '../db/client';
import { createSessions } from '../auth/sessions';
import { sweepEnded } from '../modules/rate-limits/rate-limits.repository';
import type { JobDefinition } from './job-queue';

/** Queue name of the clean-up job. */
export const SWEEP_EXPIRED = 'sweep-expired';

/**
 * Hourly clean-up: expired sessions and rate-limit windows that have ended. Its result names the process
 * that ran it, so operators (and the multi-process test) can see jobs being shared out.
 */
export function sweepExpiredJob(db: Database): JobDefinition {
  return {
    name: SWEEP_EXPIRED,
    cron: '7 * * * *',
    handler: async () => {
      await createSessions(db).sweepExpired();
      const rateLimitWindows = await sweepEnded(db);
      return { rateLimitWindows, by: `${hostname()}:${process.pid}` };
    },
  };
}
