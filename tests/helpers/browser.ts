import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { pino } from 'pino';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { CHROMIUM, launchChromium } from './chromium-launch';
import { mailbox } from './mailbox';
import { createApp } from '../../server/app';
import { createDatabase } from '../../server/db/client';
import { defaultAuthSettings } from '../../server/config/auth-settings';
import { startMailCatcher, type CapturedMail, type MailCatcher } from '../../server/mail/catcher';
import { createSmtpMailer, type Mailer } from '../../server/mail/mailer';

const root = path.resolve(import.meta.dirname, '..', '..');
// SEAMWRIGHT_DIST: another build folder, for parallel runs (scripts/lib/build-client.mjs).
const clientDir = path.join(root, process.env.SEAMWRIGHT_DIST ?? 'dist');
const screenshotDir = path.join(root, '.screenshots');

const generous = { windowMs: 60_000, limit: 10_000 };

/** What a browser test file gets: the app's address, a shared browser, and helpers for pages. */
export interface BrowserApp {
  readonly baseUrl: string;
  readonly browser: Browser;
  /** A fresh context (own cookies and storage) at a viewport size, CSP bypassed so axe can be injected. */
  newContext(viewport?: { width: number; height: number }): Promise<BrowserContext>;
  /** The app's sent mail, when the file asked for it with `useBrowserApp({ mail: true })`. */
  readonly mail: BrowserMailbox;
}

/** Reads the mail the app sent to the file's own catcher. */
export interface BrowserMailbox {
  /** Newest first. */
  all(): CapturedMail[];
  /** The newest message to `to` whose subject matches, waiting for mail sent after the reply. */
  waitFor(to: string, subject: RegExp, timeoutMs?: number): Promise<CapturedMail>;
}

/** Options of `useBrowserApp`. */
export interface BrowserAppOptions {
  /**
   * Send the app's mail over SMTP to a catcher this file starts on 127.0.0.1 (a free port), readable through
   * `app.mail` and at /api/dev/outbox. Without it mail is dropped, as before.
   */
  mail?: boolean;
}

/**
 * The real app (built client in dist/, real test database) listening on a free loopback port, and one
 * Debian Chromium for the whole test file, driven by playwright-core. `npm test` builds the client and
 * installs Chromium before the suite runs.
 */
export function useBrowserApp(options: BrowserAppOptions = {}): BrowserApp {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('Browser tests need DATABASE_URL: run them with `npm test`.');
  const state: { server?: Server; browser?: Browser; baseUrl: string; catcher?: MailCatcher } = { baseUrl: '' };
  const { db, pool } = createDatabase(url);
  const messages = () => state.catcher?.messages() ?? [];

  beforeAll(async () => {
    if (!existsSync(path.join(clientDir, 'index.html')))
      throw new Error('dist/ has no built client: run `npm test` (it builds it) or `npm run build`.');
    if (!existsSync(CHROMIUM))
      throw new Error(
        `${CHROMIUM} is missing: run \`npm test\` as root to install Debian's chromium, or \`apt-get install -y chromium\`.`,
      );
    const server = createServer();
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    state.baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    const auth = {
      ...defaultAuthSettings,
      appUrl: state.baseUrl,
      rateLimits: { signIn: generous, signUp: generous, reset: generous },
    };
    const mailing = options.mail ? await catchingMailer() : undefined;
    state.catcher = mailing?.catcher;
    const mail = mailing ? { mailer: mailing.mailer, outbox: { messages } } : {};
    server.on('request', createApp({ db, logger: pino({ level: 'silent' }), clientDir, auth, ...mail }));
    state.server = server;
    state.browser = await launchChromium();
  });

  afterAll(async () => {
    await state.browser?.close();
    await new Promise((resolve) => (state.server ? state.server.close(resolve) : resolve(undefined)));
    await state.catcher?.close();
    await pool.end();
  });

  return {
    get baseUrl() {
      return state.baseUrl;
    },
    get browser() {
      if (!state.browser) throw new Error('the browser starts in beforeAll');
      return state.browser;
    },
    newContext(viewport = { width: 1280, height: 900 }) {
      if (!state.browser) throw new Error('the browser starts in beforeAll');
      return state.browser.newContext({ viewport, bypassCSP: true, acceptDownloads: true, baseURL: state.baseUrl });
    },
    mail: {
      all: messages,
      waitFor(to, subject, timeoutMs = 10_000) {
        if (!options.mail) throw new Error('mail is dropped: call useBrowserApp({ mail: true })');
        return mailbox(messages).waitFor(to, subject, timeoutMs);
      },
    },
  };
}

/** A catcher on a free loopback port and an SMTP mailer that sends to it. */
async function catchingMailer(): Promise<{ catcher: MailCatcher; mailer: Mailer }> {
  const catcher = await startMailCatcher();
  const mailer = createSmtpMailer({
    host: catcher.host,
    port: catcher.port,
    secure: false,
    from: 'Seamwright <no-reply@seamwright.test>',
  });
  return { catcher, mailer };
}

/** The first link in a captured message that points at `path` on the app (links carry their token after #). */
export function linkIn(mail: CapturedMail, path: string): string {
  const match = new RegExp(`https?://[^\\s"<>]+${path}#token=[A-Za-z0-9_-]+`).exec(mail.text);
  if (!match) throw new Error(`no ${path} link in mail "${mail.subject}"`);
  return match[0];
}

/** Saves a full-page screenshot as .screenshots/<name>.png for a reviewer; returns the PNG bytes. */
export async function screenshot(page: Page, name: string): Promise<Buffer> {
  mkdirSync(screenshotDir, { recursive: true });
  return page.screenshot({ path: path.join(screenshotDir, `${name}.png`), fullPage: true });
}

const axeSource = readFileSync(path.join(root, 'node_modules', 'axe-core', 'axe.min.js'), 'utf8');

/** One accessibility problem axe-core found, in short. */
export interface AxeProblem {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/**
 * Runs axe-core (WCAG 2.0/2.1 A and AA rules plus best practices) on the page and returns its serious and
 * critical violations; an empty list is a pass.
 */
export async function seriousAxeViolations(page: Page): Promise<AxeProblem[]> {
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const axe = (
      window as unknown as {
        axe: {
          run: (
            ctx: Document,
            opts: object,
          ) => Promise<{
            violations: Array<{ id: string; impact: string | null; help: string; nodes: Array<{ target: string[] }> }>;
          }>;
        };
      }
    ).axe;
    const result = await axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'] },
    });
    return result.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      targets: v.nodes.slice(0, 5).map((n) => n.target.join(' ')),
    }));
  });
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}
