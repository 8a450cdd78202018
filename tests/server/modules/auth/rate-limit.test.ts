import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { uniqueEmail, useAuthApp } from '../../../helpers/auth-app';

// Small limits so the test reaches them in a few requests; other test files keep generous ones.
const tight = { windowMs: 60_000, limit: 3 };

describe('rate limits', () => {
  const { app } = useAuthApp({ signIn: tight, signUp: tight, reset: tight });

  it('answers 429 in the error shape with Retry-After once sign-in attempts run out', async () => {
    const body = { email: uniqueEmail('rl'), password: 'wrong-but-long' };
    for (let i = 0; i < tight.limit; i++)
      expect((await request(app).post('/api/auth/sign-in').send(body)).status).toBe(401);
    const res = await request(app).post('/api/auth/sign-in').send(body);
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('RATE_LIMITED');
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(60);
  });

  it('limits sign-up and reset requests the same way', async () => {
    for (let i = 0; i < tight.limit; i++) {
      await request(app)
        .post('/api/auth/password-reset/request')
        .send({ email: uniqueEmail('rr') });
      await request(app).post('/api/auth/sign-up').send({ email: 'not-an-address', password: 'x', name: '' });
    }
    const reset = await request(app)
      .post('/api/auth/password-reset/request')
      .send({ email: uniqueEmail('rr') });
    const signUp = await request(app)
      .post('/api/auth/sign-up')
      .send({ email: 'not-an-address', password: 'x', name: '' });
    expect([reset.status, signUp.status]).toEqual([429, 429]);
    expect(signUp.headers['retry-after']).toBeDefined();
  });
});
