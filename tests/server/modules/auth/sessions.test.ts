import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { PASSWORD, signUp, uniqueEmail, useAuthApp } from '../../../helpers/auth-app';

const cookieOf = (res: request.Response) => {
  const header = res.headers['set-cookie'] as unknown as string[] | undefined;
  return header?.find((c) => c.startsWith('seamwright_session=')) ?? '';
};
const idOf = (cookie: string) => cookie.split(';')[0]?.split('=')[1] ?? '';

describe('sessions', () => {
  const { app } = useAuthApp();

  it('sets an HttpOnly, SameSite=Lax cookie, Secure only over HTTPS', async () => {
    const email = uniqueEmail('cookie');
    const res = await request(app).post('/api/auth/sign-up').send({ email, password: PASSWORD, name: 'C' });
    const cookie = cookieOf(res);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);
    // Behind a TLS-terminating proxy on loopback (trusted), the request counts as HTTPS.
    const tls = await request(app)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-Proto', 'https')
      .send({ email, password: PASSWORD });
    expect(cookieOf(tls)).toMatch(/Secure/);
  });

  it('issues a new session id at sign-in and ends the one the browser had', async () => {
    const user = await signUp(app, 'fixation');
    const before = cookieOf(await user.agent.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD }));
    const after = cookieOf(await user.agent.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD }));
    expect(idOf(after)).not.toBe(idOf(before));
    const stale = await request(app)
      .get('/api/me')
      .set('Cookie', `seamwright_session=${idOf(before)}`);
    expect(stale.status).toBe(401);
  });

  it('never says which of e-mail or password was wrong', async () => {
    const user = await signUp(app, 'which');
    const badPassword = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: 'not-the-password' });
    const badEmail = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail('ghost'), password: PASSWORD });
    expect(badPassword.status).toBe(401);
    expect(badEmail.body).toEqual(badPassword.body);
  });

  it('signs out this device, or every device', async () => {
    const user = await signUp(app, 'everywhere');
    const laptop = request.agent(app);
    await laptop.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD });
    expect((await user.agent.post('/api/auth/sign-out')).status).toBe(204);
    expect((await user.agent.get('/api/me')).status).toBe(401);
    expect((await laptop.get('/api/me')).status).toBe(200);

    const tablet = request.agent(app);
    await tablet.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD });
    expect((await laptop.post('/api/auth/sign-out-everywhere')).status).toBe(204);
    expect((await laptop.get('/api/me')).status).toBe(401);
    expect((await tablet.get('/api/me')).status).toBe(401);
  });

  it('answers /api/me with 401 in the error shape when signed out, and ignores a forged cookie', async () => {
    const res = await request(app).get('/api/me').set('Cookie', 'seamwright_session=forged-session-id');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  });

  it('changes the password and signs out the other devices, keeping this one', async () => {
    const user = await signUp(app, 'change');
    const other = request.agent(app);
    await other.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD });
    const wrong = await user.agent
      .post('/api/account/password')
      .send({ currentPassword: 'not-my-password', newPassword: 'marking-gauge-2024' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.issues[0].path).toBe('currentPassword');
    const ok = await user.agent
      .post('/api/account/password')
      .send({ currentPassword: PASSWORD, newPassword: 'marking-gauge-2024' });
    expect(ok.status).toBe(204);
    expect((await user.agent.get('/api/me')).status).toBe(200);
    expect((await other.get('/api/me')).status).toBe(401);
  });
});

describe('cross-site requests', () => {
  const { app } = useAuthApp();

  it('refuses a state-changing request whose Origin is another site, with 403 in the error shape', async () => {
    const user = await signUp(app, 'csrf');
    const res = await user.agent
      .post('/api/teams')
      .set('Origin', 'https://elsewhere.example')
      .send({ name: 'Planted' });
    expect(res.status).toBe(403);
    expect(res.body).toEqual({ error: { code: 'FORBIDDEN', message: expect.stringMatching(/another site/) } });
    expect((await user.agent.get('/api/teams')).body).toHaveLength(1);
  });

  it('falls back to the Referer, and refuses an opaque "null" origin', async () => {
    const referer = await request(app)
      .post('/api/auth/sign-in')
      .set('Referer', 'https://elsewhere.example/page')
      .send({ email: 'a@quillmoss.example', password: 'whatever-long' });
    expect(referer.status).toBe(403);
    const opaque = await request(app).post('/api/auth/sign-out').set('Origin', 'null');
    expect(opaque.status).toBe(403);
  });

  it('lets same-site requests through, and reads with any origin', async () => {
    const own = await request(app).post('/api/auth/sign-out').set('Origin', 'http://seamwright.test');
    expect(own.status).toBe(204);
    const read = await request(app).get('/api/health').set('Origin', 'https://elsewhere.example');
    expect(read.status).toBe(200);
  });
});
