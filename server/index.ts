import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { EnvError, parseEnv } from './config/env';
import { createApp } from './app';
import { createDatabase } from './db/client';
import { createLogger } from './logger';
import { authSettingsFromEnv } from './config/auth-settings';
import { startMailCatcher, type MailCatcher } from './mail/catcher';
import { createSmtpMailer } from './mail/mailer';
import { createGeometryPool } from './geometry/geometry-pool';
import { startJobQueue, type JobQueue } from './jobs/job-queue';
import { sweepExpiredJob } from './jobs/sweep-expired';

// In-flight requests get this long to finish after Ctrl-C before their connections are cut.
const SHUTDOWN_GRACE_MS = 10_000;

function loadEnv() {
  try {
    return parseEnv(process.env);
  } catch (error) {
    if (error instanceof EnvError) {
      process.stderr.write(`${error.message}\n`);
      process.exit(1);
    }
    throw error;
  }
}

const env = loadEnv();
const logger = createLogger(env.LOG_LEVEL);
const { db, pool } = createDatabase(env.DATABASE_URL);
const clientDir = env.CLIENT_DIR ?? path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../dist');

// With MAIL_CATCHER=on (development, tests, the `npm start` demo) a local SMTP server inside this
// process receives every message, and /dev/outbox shows them; nothing leaves the machine.
let catcher: MailCatcher | undefined;
if (env.MAIL_CATCHER === 'on') {
  catcher = await startMailCatcher();
  logger.info({ smtp: `${catcher.host}:${catcher.port}` }, 'local mail catcher is running; messages at /dev/outbox');
}
const mailer = createSmtpMailer({
  host: catcher?.host ?? env.SMTP_HOST ?? '127.0.0.1',
  port: catcher?.port ?? env.SMTP_PORT,
  secure: catcher ? false : env.SMTP_SECURE,
  user: catcher ? undefined : env.SMTP_USER,
  password: env.SMTP_PASSWORD,
  from: env.MAIL_FROM,
});
// Solids are built on worker threads so that requests keep being answered while kits are made.
const geometry = createGeometryPool({ threads: env.GEOMETRY_THREADS });
const app = createApp({ db, logger, clientDir, mailer, outbox: catcher, auth: authSettingsFromEnv(env), geometry });

// Jobs (the hourly clean-up now; model work later) go through pg-boss on the same database, shared out
// between every server process. A database that is down at start-up only delays them: retry until it answers.
const JOB_RETRY_MS = 15_000;
let jobs: JobQueue | undefined;
let jobsTimer: NodeJS.Timeout | undefined;
async function startJobs() {
  try {
    jobs = await startJobQueue(env.DATABASE_URL, [sweepExpiredJob(db)], logger);
  } catch (error) {
    logger.warn({ err: error }, `the job queue could not start; trying again in ${JOB_RETRY_MS / 1000} s`);
    jobsTimer = setTimeout(() => void startJobs(), JOB_RETRY_MS);
    jobsTimer.unref();
  }
}
void startJobs();

const server = app.listen(env.PORT, env.HOST);
server.on('listening', () => {
  logger.info({ url: `http://${env.HOST}:${env.PORT}` }, 'Seamwright is listening');
  process.send?.({ type: 'listening', port: env.PORT });
});
server.on('error', (error: NodeJS.ErrnoException) => {
  const hint =
    error.code === 'EADDRINUSE'
      ? `Port ${env.PORT} on ${env.HOST} is already in use. Stop the program using it, or pick another port: PORT=3100 npm start`
      : `The server could not start: ${error.message}`;
  process.stderr.write(`${hint}\n`);
  process.exit(1);
});

let stopping = false;
function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'shutting down: no new requests, finishing those in flight');
  const force = setTimeout(() => server.closeAllConnections(), SHUTDOWN_GRACE_MS);
  force.unref();
  server.close(async () => {
    clearTimeout(jobsTimer);
    await jobs?.stop().catch((error: unknown) => logger.warn({ err: error }, 'job queue did not stop cleanly'));
    await geometry.close();
    await catcher?.close();
    await pool.end();
    logger.info('stopped');
    process.exit(0);
  });
  server.closeIdleConnections();
}
process.on('SIGINT', () => shutdown('SIGINT'));
process.on('SIGTERM', () => shutdown('SIGTERM'));
