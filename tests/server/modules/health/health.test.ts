import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { pino } from 'pino';
import { createApp } from '../../../../server/app';
import { createDatabase } from '../../../../server/db/client';
import { useTestApp } from '../../../helpers/test-app';

describe('GET /api/health', () => {
  const { app } = useTestApp();

  it('answers ok when the database answers', async () => {
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'ok' });
  });

  it('answers 503 with db down when the database cannot be reached', async () => {
    // Port 1 on loopback has no PostgreSQL: the ping fails fast.
    const { db, pool } = createDatabase('postgres://postgres@127.0.0.1:1/nowhere');
    const downApp = createApp({ db, logger: pino({ level: 'silent' }) });
    const res = await request(downApp).get('/api/health');
    await pool.end();
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ status: 'degraded', db: 'down' });
  });
});
