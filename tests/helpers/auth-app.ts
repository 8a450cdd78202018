import { mailbox } from './mailbox';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll } from 'vitest';
import { pino } from 'pino';
import request from 'supertest';
import type { Express } from 'express';
import { createApp } from '../../server/app';
import { createDatabase } from '../../server/db/client';
import { createSessions } from '../../server/auth/sessions';
import { startMailCatcher, type CapturedMail, type MailCatcher } from '../../server/mail/catcher';
import { createSmtpMailer, type Mailer } from '../../server/mail/mailer';
import { defaultAuthSettings } from '../../server/config/auth-settings';
import type { AuthRateLimits } from '../../server/modules/auth/auth.routes';

export const APP_URL = 'http://seamwright.test';
const generous = { windowMs: 60_000, limit: 10_000 };

/**
 * The real app on the real test database, sending mail over SMTP to a local catcher that this test
 * file starts on 127.0.0.1 (a free port); each file has its own catcher, so files running in
 * parallel never see each other's mail. Rate limits are generous unless a test asks otherwise.
 */
export function useAuthApp(rateLimits: Partial<AuthRateLimits> = {}) {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('API tests need DATABASE_URL: run them with `npm test`.');
  const { db, pool } = createDatabase(url);
  let catcher: MailCatcher | undefined;
  let smtp: Mailer | undefined;
  const ready = startMailCatcher().then((c) => {
    catcher = c;
    smtp = createSmtpMailer({
      host: c.host,
      port: c.port,
      secure: false,
      from: 'Seamwright <no-reply@seamwright.test>',
    });
  });
  // The app is built before the catcher's port is known; sending waits for it.
  const mailer: Mailer = { send: async (mail) => (await ready, smtp?.send(mail)) };
  const outbox = { messages: () => catcher?.messages() ?? [] };
  const auth = {
    ...defaultAuthSettings,
    appUrl: APP_URL,
    rateLimits: { signIn: generous, signUp: generous, reset: generous, ...rateLimits },
  };
  const app = createApp({ db, logger: pino({ level: 'silent' }), mailer, outbox, auth });
  beforeAll(() => ready);
  afterAll(async () => {
    await catcher?.close();
    await pool.end();
  });
  return { app, db, pool, sessions: createSessions(db), mail: mailbox(() => outbox.messages()) };
}

/** The token in a mailed link (it sits in the URL fragment). */
export function tokenFrom(mail: CapturedMail): string {
  const match = /#token=([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!match?.[1]) throw new Error(`no link token in mail "${mail.subject}"`);
  return match[1];
}

/** A fresh address on the invented studio's domain, unique per call. */
export function uniqueEmail(who = 'user'): string {
  return `${who}-${randomUUID().slice(0, 8)}@quillmoss.example`;
}

export const PASSWORD = 'walnut-dowel-clamp-77';

/** Signs up a new account through the API; the agent keeps its session cookie. */
export async function signUp(app: Express, who = 'user', name = 'Test Person') {
  const agent = request.agent(app);
  const email = uniqueEmail(who);
  const res = await agent.post('/api/auth/sign-up').send({ email, password: PASSWORD, name });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return {
    agent,
    email,
    name,
    id: res.body.user.id as string,
    personalTeamId: res.body.teams[0].id as string,
  };
}
