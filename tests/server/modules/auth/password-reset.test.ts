import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { accountTokens } from '../../../../server/db/schema';
import { hashLinkToken } from '../../../../server/auth/tokens';
import { PASSWORD, signUp, tokenFrom, uniqueEmail, useAuthApp } from '../../../helpers/auth-app';

describe('password reset', () => {
  const { app, db, mail } = useAuthApp();

  it('sets a new password, signs out every device, and refuses the link a second time', async () => {
    const user = await signUp(app, 'reset');
    const phone = request.agent(app);
    await phone.post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD });
    expect((await phone.get('/api/me')).status).toBe(200);

    const asked = await request(app).post('/api/auth/password-reset/request').send({ email: user.email });
    expect(asked.status).toBe(202);
    const message = await mail.waitFor(user.email, /new Seamwright password/);
    expect(message.text).toContain('one hour');
    expect(message.html).toContain('Choose a new password');
    const token = tokenFrom(message);

    const newPassword = 'spokeshave-and-rasp-9';
    const done = await request(app).post('/api/auth/password-reset/confirm').send({ token, password: newPassword });
    expect(done.status).toBe(204);
    expect((await user.agent.get('/api/me')).status).toBe(401);
    expect((await phone.get('/api/me')).status).toBe(401);

    const again = await request(app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'another-fine-password' });
    expect(again.status).toBe(400);
    expect(again.body.error.message).toMatch(/expired or was already used/);

    const old = await request(app).post('/api/auth/sign-in').send({ email: user.email, password: PASSWORD });
    expect(old.status).toBe(401);
    const fresh = await request(app).post('/api/auth/sign-in').send({ email: user.email, password: newPassword });
    expect(fresh.status).toBe(200);
  });

  it('answers the same whether or not the address has an account', async () => {
    const user = await signUp(app, 'exists');
    const known = await request(app).post('/api/auth/password-reset/request').send({ email: user.email });
    const unknown = await request(app)
      .post('/api/auth/password-reset/request')
      .send({ email: uniqueEmail('nobody') });
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
  });

  it('refuses an expired reset link', async () => {
    const user = await signUp(app, 'expired');
    await request(app).post('/api/auth/password-reset/request').send({ email: user.email });
    const token = tokenFrom(await mail.waitFor(user.email, /new Seamwright password/));
    await db
      .update(accountTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(accountTokens.tokenHash, hashLinkToken(token)));
    const res = await request(app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'late-but-long-enough' });
    expect(res.status).toBe(400);
    expect((await user.agent.get('/api/me')).status).toBe(200); // nothing changed
  });

  it('refuses a common password without using up the link', async () => {
    const user = await signUp(app, 'common');
    await request(app).post('/api/auth/password-reset/request').send({ email: user.email });
    const token = tokenFrom(await mail.waitFor(user.email, /new Seamwright password/));
    const weak = await request(app).post('/api/auth/password-reset/confirm').send({ token, password: 'qwertyuiop' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.issues).toEqual([{ path: 'password', message: expect.stringMatching(/most common/) }]);
    const strong = await request(app)
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'mortise-tenon-42x' });
    expect(strong.status).toBe(204);
  });
});

describe('e-mail verification links', () => {
  const { app, db, mail } = useAuthApp();

  it('works once, and not after it expires', async () => {
    const user = await signUp(app, 'verify');
    const token = tokenFrom(await mail.waitFor(user.email, /Confirm/));
    expect((await request(app).post('/api/auth/verify-email').send({ token })).status).toBe(200);
    expect((await request(app).post('/api/auth/verify-email').send({ token })).status).toBe(400);

    const late = await signUp(app, 'late');
    const lateToken = tokenFrom(await mail.waitFor(late.email, /Confirm/));
    await db
      .update(accountTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(accountTokens.tokenHash, hashLinkToken(lateToken)));
    expect((await request(app).post('/api/auth/verify-email').send({ token: lateToken })).status).toBe(400);
    expect((await late.agent.get('/api/account')).body.emailVerified).toBe(false);
  });

  it('mails a new link on request, and the older one stops working', async () => {
    const user = await signUp(app, 'resend');
    const first = tokenFrom(await mail.waitFor(user.email, /Confirm/));
    expect((await user.agent.post('/api/auth/resend-verification')).status).toBe(204);
    const newer = mail.all().find((m) => m.to.includes(user.email) && !m.text.includes(first));
    if (!newer) throw new Error('no second verification mail');
    const second = tokenFrom(newer);
    expect((await request(app).post('/api/auth/verify-email').send({ token: first })).status).toBe(400);
    expect((await request(app).post('/api/auth/verify-email').send({ token: second })).status).toBe(200);
  });
});
