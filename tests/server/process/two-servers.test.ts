// Two server processes on one database, as a deployment with more than one instance runs: whatever one of
// them writes (a session, a rate-limit count, a queued job) the other must see. Nothing here may live in
// process memory.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import PgBoss from 'pg-boss';
import {
  call,
  killLeftoverServers,
  signUpOn,
  startServerProcess,
  uniqueRateLimitScope,
  type ServerProcess,
} from '../../helpers/server-process';

const SIGN_IN_LIMIT = 4;
const JOBS = 6;

/** Asks `probe` every 100 ms until it answers something other than undefined, for at most `ms`. */
async function until<T>(probe: () => Promise<T | undefined>, ms: number, what: string): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const value = await probe();
    if (value !== undefined) return value;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe('two server processes on one database', () => {
  const url = process.env.DATABASE_URL ?? '';
  let a: ServerProcess;
  let b: ServerProcess;
  let account: Awaited<ReturnType<typeof signUpOn>>;
  let boss: PgBoss | undefined;
  let db: pg.Client;

  beforeAll(async () => {
    // The same scope for both: they are one deployment and must share one allowance per client.
    const shared = { RATE_LIMIT_SCOPE: uniqueRateLimitScope(), RATE_LIMIT_SIGN_IN: String(SIGN_IN_LIMIT) };
    [a, b] = await Promise.all([startServerProcess(shared), startServerProcess(shared)]);
    db = new pg.Client({ connectionString: url });
    await db.connect();
  });
  afterAll(async () => {
    await boss?.stop({ graceful: false, wait: true, timeout: 5_000 }).catch(() => {});
    await db?.end().catch(() => {});
    await Promise.all([a?.stop(), b?.stop()]);
    await killLeftoverServers();
  });

  it('reads a session started on one server on the other, and a sign-out on either ends it on both', async () => {
    account = await signUpOn(a, 'two-servers');

    const onB = await call(b, 'GET', '/api/me', { cookie: account.cookie });
    expect(onB.status).toBe(200);
    const me = (await onB.json()) as { user: { id: string; email: string } };
    expect(me.user).toMatchObject({ id: account.userId, email: account.email });
    expect((await call(a, 'GET', '/api/me', { cookie: account.cookie })).status).toBe(200);

    expect((await call(b, 'POST', '/api/auth/sign-out', { cookie: account.cookie })).status).toBe(204);
    const onA = await call(a, 'GET', '/api/me', { cookie: account.cookie });
    expect(onA.status).toBe(401);
    expect((await call(b, 'GET', '/api/me', { cookie: account.cookie })).status).toBe(401);
  });

  it('counts sign-in attempts on both servers against one limit', async () => {
    const wrong = { email: account.email, password: 'not-the-password-at-all' };
    const servers = [a, b];
    const statuses: number[] = [];
    for (let i = 0; i < SIGN_IN_LIMIT; i++) {
      const res = await call(servers[i % 2]!, 'POST', '/api/auth/sign-in', { body: wrong });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([401, 401, 401, 401]);

    // The fifth attempt overall is refused wherever it lands, and so is the right password after it.
    for (const [server, body] of [
      [a, wrong],
      [b, wrong],
      [b, { email: account.email, password: account.password }],
    ] as const) {
      const res = await call(server, 'POST', '/api/auth/sign-in', { body });
      expect(res.status).toBe(429);
      expect(Number(res.headers.get('retry-after'))).toBeGreaterThan(0);
      const answer = (await res.json()) as { error: { code: string; message: string } };
      expect(answer).toEqual({ error: { code: 'RATE_LIMITED', message: expect.stringMatching(/sign-in/) } });
    }
  });

  it('runs each queued clean-up job exactly once, on one of the two servers, and it sweeps expired sessions', async () => {
    const expiredId = `expired${randomUUID().replaceAll('-', '')}`;
    await db.query(`insert into sessions (id, user_id, expires_at) values ($1, $2, now() - interval '1 day')`, [
      expiredId,
      account.userId,
    ]);

    boss = new PgBoss({ connectionString: url, schema: 'pgboss', max: 2, supervise: false, schedule: false });
    boss.on('error', () => {});
    await boss.start();
    // The servers start their job queues after they listen; jobs need the queue each of them creates.
    await until(async () => (await boss!.getQueue('sweep-expired')) ?? undefined, 20_000, 'the sweep-expired queue');

    const ids: string[] = [];
    for (let i = 0; i < JOBS; i++) {
      const id = await boss.send('sweep-expired', {});
      expect(id).toEqual(expect.any(String));
      ids.push(id!);
    }
    const jobs = await Promise.all(
      ids.map((id) =>
        until(
          async () => {
            const job = await boss!.getJobById<object>('sweep-expired', id);
            return job && (job.state === 'completed' || job.state === 'failed') ? job : undefined;
          },
          20_000,
          `job ${id}`,
        ),
      ),
    );

    const pids = new Set([a.pid, b.pid]);
    const ranBy: number[] = [];
    for (const job of jobs) {
      expect(job.state).toBe('completed');
      // Never retried: a job that pg-boss handed out twice would have been retried or failed.
      expect(job.retryCount).toBe(0);
      const output = job.output as { by?: string; rateLimitWindows?: number };
      expect(output.rateLimitWindows).toEqual(expect.any(Number));
      const pid = Number(/:(\d+)$/.exec(output.by ?? '')?.[1]);
      expect(pids.has(pid), `job ${job.id} ran by ${output.by}`).toBe(true);
      ranBy.push(pid);
    }
    const count = (pid: number) => ranBy.filter((p) => p === pid).length;
    console.info(`sweep-expired jobs: ${count(a.pid)} on A (pid ${a.pid}), ${count(b.pid)} on B (pid ${b.pid})`);

    const left = await db.query('select 1 from sessions where id = $1', [expiredId]);
    expect(left.rowCount).toBe(0);
  });
});
