import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { screenshot, seriousAxeViolations, useBrowserApp, type AxeProblem } from '../helpers/browser';

const app = useBrowserApp();

// Every screen a visitor can reach without an account, and what to wait for before checking it.
const publicPages = [
  { path: '/', name: 'home', ready: 'Join printed parts' },
  { path: '/design', name: 'design', ready: 'Up to date.' },
  { path: '/sign-in', name: 'sign-in' },
  { path: '/sign-up', name: 'sign-up' },
  { path: '/reset-password', name: 'reset-password' },
  { path: '/verify-email', name: 'verify-email' },
  { path: '/invitations/accept', name: 'accept-invitation' },
  { path: '/no-such-page', name: 'not-found', ready: 'Page not found' },
];
// The screens behind sign-in.
const memberPages = [
  { path: '/', name: 'home-signed-in', ready: 'Join printed parts' },
  { path: '/design', name: 'design-signed-in', ready: 'Up to date.' },
  { path: '/team', name: 'team' },
  { path: '/account', name: 'account' },
];

async function check(page: Page, target: { path: string; name: string; ready?: string }): Promise<AxeProblem[]> {
  await page.goto(target.path);
  if (target.ready) await page.getByText(target.ready).first().waitFor({ timeout: 20_000 });
  await page.locator('h1').first().waitFor({ timeout: 20_000 });
  await page.waitForLoadState('networkidle');
  await screenshot(page, `page-${target.name}`);
  return (await seriousAxeViolations(page)).map((v) => ({ ...v, id: `${target.path}: ${v.id}` }));
}

let context: BrowserContext;
beforeAll(async () => {
  context = await app.newContext();
});
afterAll(() => context?.close());

describe('every page', () => {
  it('has no serious or critical axe violations when nobody is signed in', async () => {
    const page = await context.newPage();
    const problems: AxeProblem[] = [];
    for (const target of publicPages) problems.push(...(await check(page, target)));
    expect(problems).toEqual([]);
    await page.close();
  });

  it('has no serious or critical axe violations when a member is signed in', async () => {
    const member = await app.newContext();
    const email = `e2e-${randomUUID().slice(0, 8)}@quillmoss.example`;
    const res = await member.request.post('/api/auth/sign-up', {
      data: { email, password: 'walnut-dowel-clamp-77', name: 'Bench Tester' },
    });
    expect(res.status()).toBe(201);
    const page = await member.newPage();
    const problems: AxeProblem[] = [];
    for (const target of memberPages) problems.push(...(await check(page, target)));
    expect(problems).toEqual([]);
    await member.close();
  });

  it('has no serious or critical axe violations on a 390 px phone', async () => {
    const phone = await app.newContext({ width: 390, height: 844 });
    const page = await phone.newPage();
    const problems: AxeProblem[] = [];
    for (const target of [publicPages[0]!, publicPages[1]!])
      problems.push(...(await check(page, { ...target, name: `${target.name}-phone` })));
    expect(problems).toEqual([]);
    await phone.close();
  });
});
