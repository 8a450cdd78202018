import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { sql } from 'drizzle-orm';
import { PASSWORD, signUp, tokenFrom, uniqueEmail, useAuthApp } from '../../../helpers/auth-app';

const SQL = "Robert'); DROP TABLE users; --";
const HTML = '<img src=x onerror="alert(1)"><script>alert("team")</script> & "quotes"';

describe('bad input', () => {
  const { app, db, mail } = useAuthApp();
  const signUpWith = (body: object) => request(app).post('/api/auth/sign-up').send(body);

  it('refuses overlong e-mail addresses and passwords with a 400 naming the field', async () => {
    const longLocal = await signUpWith({ email: `${'a'.repeat(65)}@quillmoss.example`, password: PASSWORD, name: 'L' });
    expect(longLocal.status).toBe(400);
    const longEmail = await signUpWith({ email: `a@${'b'.repeat(250)}.example`, password: PASSWORD, name: 'L' });
    expect(longEmail.body.error.issues[0].path).toBe('email');
    const huge = await signUpWith({ email: 'x'.repeat(100_000), password: PASSWORD, name: 'L' });
    expect(huge.status).toBe(400);
    const longPassword = await signUpWith({ email: uniqueEmail('lp'), password: 'p'.repeat(257), name: 'L' });
    expect(longPassword.body.error.issues).toEqual([{ path: 'password', message: 'Use at most 256 characters.' }]);
    const hugePassword = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail('hp'), password: 'p'.repeat(100_000) });
    expect(hugePassword.status).toBe(400);
    const short = await signUpWith({ email: uniqueEmail('sp'), password: 'short', name: 'L' });
    expect(short.body.error.issues[0]).toEqual({ path: 'password', message: 'Use at least 10 characters.' });
    const longest = await signUpWith({ email: uniqueEmail('ok'), password: 'p'.repeat(256), name: 'L' });
    expect(longest.status).toBe(201);
  });

  it('refuses passwords from the common-passwords list', async () => {
    const res = await signUpWith({ email: uniqueEmail('cp'), password: 'password123', name: 'C' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('password');
  });

  it('normalises look-alike addresses: full-width letters, invisible characters, spaces, domain case', async () => {
    const id = uniqueEmail('wide').split('@')[0] as string;
    // Full-width "Ａｄａ", a zero-width space and an upper-case domain written in full-width letters.
    const typed = `  Ａｄａ${id}\u200B@ＱＵＩＬＬＭＯＳＳ.EXAMPLE `;
    const res = await signUpWith({ email: typed, password: PASSWORD, name: 'Wide' });
    expect(res.status).toBe(201);
    expect(res.body.user.email).toBe(`Ada${id}@quillmoss.example`);
    const twin = await signUpWith({ email: `ada${id}@quillmoss.example`, password: PASSWORD, name: 'Twin' });
    expect(twin.status).toBe(409);
    const signIn = await request(app)
      .post('/api/auth/sign-in')
      .send({ email: `ADA${id}@Quillmoss.Example`, password: PASSWORD });
    expect(signIn.status).toBe(200);
  });

  it('refuses a domain with letters from another script that only look like Latin ones', async () => {
    // "quillmоss" with a Cyrillic о (U+043E).
    const res = await signUpWith({ email: 'ada@quillm\u043Ess.example', password: PASSWORD, name: 'Homoglyph' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('email');
  });

  it('stores SQL and HTML in every text field verbatim and escapes them in e-mails', async () => {
    const owner = await signUp(app, 'verbatim', SQL);
    expect((await owner.agent.get('/api/me')).body.user.name).toBe(SQL);
    await owner.agent
      .post('/api/auth/verify-email')
      .send({ token: tokenFrom(await mail.waitFor(owner.email, /Confirm/)) });
    const team = await owner.agent.post('/api/teams').send({ name: HTML });
    expect(team.body.name).toBe(HTML);
    expect((await owner.agent.get(`/api/teams/${team.body.id}`)).body.name).toBe(HTML);
    const invitee = uniqueEmail('verbatim-invitee');
    await owner.agent.post(`/api/teams/${team.body.id}/invitations`).send({ email: invitee, role: 'viewer' });
    const message = await mail.waitFor(invitee, /invited you/);
    expect(message.text).toContain(HTML);
    expect(message.html).not.toContain('<script>');
    expect(message.html).toContain('&lt;script&gt;');
    const members = await owner.agent.get(`/api/teams/${team.body.id}/members`);
    expect(members.body[0].name).toBe(SQL);
    const tables = await db.execute(sql`select count(*)::int as n from users`);
    expect(tables.rows[0]?.n).toBeGreaterThan(0);
  });
});

describe('mail', () => {
  const { app, mail } = useAuthApp();

  it('sends plain-text and HTML parts with no tracking, visible in the dev outbox', async () => {
    const user = await signUp(app, 'outbox');
    const message = await mail.waitFor(user.email, /Confirm/);
    expect(message.text.length).toBeGreaterThan(50);
    expect(message.html).toMatch(/^<!doctype html>/);
    expect(message.html).not.toMatch(/<img|utm_|pixel/i);
    const outbox = await request(app).get('/api/dev/outbox');
    expect(outbox.body.messages.map((m: { to: string[] }) => m.to[0])).toContain(user.email);
  });
});
