// The app's PostgreSQL goes away and comes back while the server keeps running. The shared test cluster is
// never stopped (other files use it at the same time): the app reaches it through a TCP proxy, and taking
// the proxy away is the outage.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pino } from 'pino';
import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '../../../server/app';
import { createDatabase } from '../../../server/db/client';
import { SESSION_COOKIE } from '../../../server/auth/sessions';
import { DATABASE_DOWN_MESSAGE } from '../../../server/errors/from-postgres';
import { defaultAuthSettings } from '../../../server/config/auth-settings';
import { PASSWORD, signUp } from '../../helpers/auth-app';
import { startTcpProxy, type TcpProxy } from './tcp-proxy';

const smallKit = {
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  face: { shape: 'rect', width: 40, height: 30 },
  key: { shape: 'square', width: 6, depth: 5, count: 2 },
};

/** Asks `probe` every 100 ms until it is true, for at most `ms`. */
async function eventually(probe: () => Promise<boolean>, ms = 5_000): Promise<boolean> {
  const until = Date.now() + ms;
  for (;;) {
    if (await probe()) return true;
    if (Date.now() > until) return false;
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** True when a Set-Cookie header of the reply touches the session cookie (sets or clears it). */
const touchesSession = (res: request.Response) =>
  ([] as string[]).concat(res.headers['set-cookie'] ?? []).some((c) => c.startsWith(`${SESSION_COOKIE}=`));

function expectUnavailable(res: request.Response) {
  expect(res.status).toBe(503);
  expect(res.body).toEqual({ error: { code: 'SERVICE_UNAVAILABLE', message: DATABASE_DOWN_MESSAGE } });
  expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
}

describe('the API while PostgreSQL is down', () => {
  let proxy: TcpProxy;
  let app: Express;
  let close: () => Promise<void>;
  let person: Awaited<ReturnType<typeof signUp>>;

  beforeAll(async () => {
    const url = new URL(process.env.DATABASE_URL ?? '');
    if (!url.port) throw new Error('API tests need DATABASE_URL with a host and port: run them with `npm test`.');
    proxy = await startTcpProxy({ host: url.hostname, port: Number(url.port) });
    const viaProxy = new URL(url);
    viaProxy.hostname = '127.0.0.1';
    viaProxy.port = String(proxy.port);
    const { db, pool } = createDatabase(viaProxy.toString());
    close = () => pool.end();
    const generous = { windowMs: 60_000, limit: 10_000 };
    app = createApp({
      db,
      logger: pino({ level: 'silent' }),
      auth: { ...defaultAuthSettings, rateLimits: { signIn: generous, signUp: generous, reset: generous } },
    });
    person = await signUp(app, 'outage', 'Outage Person');
  });
  afterAll(async () => {
    await proxy.start().catch(() => {}); // already listening when the last test passed
    await close();
    await proxy.stop();
  });

  it('answers 503 in the error shape, keeps the session and serves what needs no database when it is down', async () => {
    const team = `/api/teams/${person.personalTeamId}`;
    expect((await person.agent.get(team)).status).toBe(200);
    await proxy.stop();

    const health = await request(app).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body).toEqual({ status: 'degraded', db: 'down' });

    // Designing needs no database, signed out or signed in.
    expect((await request(app).post('/api/kits/summary').send(smallKit)).status).toBe(200);
    expect((await person.agent.post('/api/kits/summary').send(smallKit)).status).toBe(200);

    const read = await person.agent.get(team);
    expectUnavailable(read);
    expect(touchesSession(read)).toBe(false); // the session is fine: the cookie must not be cleared
    expectUnavailable(await person.agent.post('/api/teams').send({ name: 'During the outage' }));
    expectUnavailable(await request(app).post('/api/auth/sign-in').send({ email: person.email, password: PASSWORD }));
  });

  it('answers again by itself, same session, when the database is back', async () => {
    await proxy.start();
    const team = `/api/teams/${person.personalTeamId}`;
    expect(await eventually(async () => (await request(app).get('/api/health')).status === 200)).toBe(true);
    const read = await person.agent.get(team);
    expect(read.status).toBe(200);
    expect(read.body.id).toBe(person.personalTeamId);
    const signIn = await request(app).post('/api/auth/sign-in').send({ email: person.email, password: PASSWORD });
    expect(signIn.status).toBe(200);
  });
});
