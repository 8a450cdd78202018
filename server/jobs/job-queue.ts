import PgBoss from 'pg-boss';
import type { Logger } from 'pino';

/** A job handler: gets the job's data, resolves when done; a rejection marks the job failed (and retried). */
export type JobHandler = (data: Record<string, unknown>) => Promise<unknown>;

export interface JobQueue {
  /** Queues a job; any server process on the database may run it. Returns the job id. */
  send(name: string, data?: Record<string, unknown>): Promise<string | null>;
  /** Stops taking jobs, lets running ones finish (up to `timeoutMs`), closes the queue's connections. */
  stop(timeoutMs?: number): Promise<void>;
}

export interface JobDefinition {
  name: string;
  handler: JobHandler;
  /** Cron expression (UTC) for a recurring job; pg-boss runs each tick once across all processes. */
  cron?: string;
}

/**
 * Starts pg-boss on the project's own PostgreSQL (its tables live in the `pgboss` schema) and works the
 * given queues. Every server process does this, so jobs are shared out between them and a scheduled job runs
 * once per tick however many processes there are.
 *
 * @param connectionString - the app's DATABASE_URL
 * @param jobs - queues to create and work, see {@link JobDefinition}
 * @param logger - where job failures are reported
 */
export async function startJobQueue(connectionString: string, jobs: JobDefinition[], logger: Logger): Promise<JobQueue> {
  const boss = new PgBoss({ connectionString, schema: 'pgboss', max: 3 });
  // pg-boss reports lost connections here; without a listener they would crash the process.
  boss.on('error', (error) => logger.warn({ err: error }, 'job queue error'));
  await boss.start();
  for (const job of jobs) {
    await boss.createQueue(job.name);
    if (job.cron) await boss.schedule(job.name, job.cron);
    await boss.work<Record<string, unknown>>(job.name, async ([item]) => {
      if (!item) return undefined;
      return job.handler(item.data ?? {});
    });
  }
  return {
    send: (name, data = {}) => boss.send(name, data),
    stop: (timeoutMs = 10_000) => boss.stop({ graceful: true, wait: true, timeout: timeoutMs }),
  };
}
