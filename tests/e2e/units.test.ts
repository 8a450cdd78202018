import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { screenshot, seriousAxeViolations, useBrowserApp } from '../helpers/browser';

const app = useBrowserApp();
const PASSWORD = 'walnut-dowel-clamp-77';
const email = `units-${randomUUID().slice(0, 8)}@quillmoss.example`;
const contexts: BrowserContext[] = [];

/** A fresh browser context (own cookies, empty localStorage) with one page. */
async function freshPage(): Promise<{ context: BrowserContext; page: Page }> {
  const context = await app.newContext();
  contexts.push(context);
  const page = await context.newPage();
  page.setDefaultTimeout(10_000);
  return { context, page };
}

// The page loads the session, then the account: give it longer than expect.poll's one second.
const poll = <T>(read: () => Promise<T>) => expect.poll(read, { timeout: 15_000 });
const faceWidth = (page: Page) => page.getByLabel('Face width (x)', { exact: true });
const accountUnits = async (context: BrowserContext) =>
  ((await (await context.request.get('/api/account')).json()) as { units: string }).units;

beforeAll(async () => {
  const { context } = await freshPage();
  const res = await context.request.post('/api/auth/sign-up', {
    data: { email, password: PASSWORD, name: 'Units Tester' },
  });
  expect(res.status()).toBe(201);
});
afterAll(async () => {
  for (const context of contexts) await context.close();
});

describe('units', () => {
  it('puts the choice back and says so when saving the units fails', async () => {
    const { page } = await freshPage();
    await page.request.post('/api/auth/sign-in', { data: { email, password: PASSWORD } });
    await page.route('**/api/account', (route) =>
      route.request().method() === 'PATCH'
        ? route.fulfill({
            status: 503,
            contentType: 'application/json',
            body: JSON.stringify({ error: { code: 'SERVICE_UNAVAILABLE', message: 'The bench is closed.' } }),
          })
        : route.continue(),
    );
    await page.goto('/account');
    const inches = page.getByRole('radio', { name: 'Inches' });
    // click, not check(): the refused save puts the choice back at once, which check() would take for a failure.
    await inches.click();
    await poll(() => page.getByRole('alert').innerText()).toContain('The bench is closed.');
    await poll(() => page.getByRole('radio', { name: 'Millimetres' }).isChecked()).toBe(true);
    expect(await inches.isChecked()).toBe(false);
    // The design screen's switch says so too.
    await page.goto('/design');
    await page.getByText('Inches', { exact: true }).click();
    await poll(() => page.getByText('Your choice of units was not saved: The bench is closed.').count()).toBe(1);
    await poll(() => page.getByRole('radio', { name: 'Millimetres' }).isChecked()).toBe(true);
  });

  it('saves inches from the account page with the keyboard, for this account', async () => {
    const { context, page } = await freshPage();
    await page.request.post('/api/auth/sign-in', { data: { email, password: PASSWORD } });
    await page.goto('/account');
    const mm = page.getByRole('radio', { name: 'Millimetres' });
    await poll(() => mm.isChecked()).toBe(true);
    // A radio group: Tab reaches the chosen radio, an arrow key moves the choice.
    await mm.focus();
    const saved = page.waitForResponse((r) => r.url().endsWith('/api/account') && r.request().method() === 'PATCH');
    await page.keyboard.press('ArrowRight');
    expect((await saved).status()).toBe(200);
    expect(await page.getByRole('radio', { name: 'Inches' }).isChecked()).toBe(true);
    await poll(() => page.getByRole('status').filter({ hasText: 'Saved.' }).count()).toBe(1);
    expect(await accountUnits(context)).toBe('in');
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'account-units');
  });

  it('opens the design screen in inches in a new browser, and switching units keeps the sizes', async () => {
    const { context, page } = await freshPage();
    await page.goto('/sign-in');
    await page.getByLabel('E-mail address').fill(email);
    await page.getByLabel('Password').fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((url) => url.pathname !== '/sign-in');
    await page.goto('/design');

    await poll(() => page.getByRole('radio', { name: 'Inches' }).isChecked()).toBe(true);
    await page.getByText('Lengths in inches.').waitFor();
    // The default face is 80 mm wide: 80 / 25.4 = 3.1496 in at the field's 4 decimals.
    await poll(() => faceWidth(page).inputValue()).toBe('3.1496');

    await page.getByText('Millimetres', { exact: true }).click();
    await poll(() => faceWidth(page).inputValue()).toBe('80');
    // Signed in, the design screen's switch is the account's choice too.
    await poll(() => accountUnits(context)).toBe('mm');

    await page.getByText('Inches', { exact: true }).click();
    await poll(() => faceWidth(page).inputValue()).toBe('3.1496');
    await faceWidth(page).fill('4');
    await page.getByText('Millimetres', { exact: true }).click();
    await poll(() => faceWidth(page).inputValue()).toBe('101.6');
    await page.getByText('Inches', { exact: true }).click();
    await poll(() => faceWidth(page).inputValue()).toBe('4');
    await poll(() => accountUnits(context)).toBe('in');
  });

  it('remembers the choice on this browser when nobody is signed in', async () => {
    const { page } = await freshPage();
    await page.goto('/design');
    await poll(() => page.getByRole('radio', { name: 'Millimetres' }).isChecked()).toBe(true);
    await page.getByText('Inches', { exact: true }).click();
    await poll(() => faceWidth(page).inputValue()).toBe('3.1496');
    await page.reload();
    await poll(() => page.getByRole('radio', { name: 'Inches' }).isChecked()).toBe(true);
    await poll(() => faceWidth(page).inputValue()).toBe('3.1496');
  });

  it('carries a choice an earlier version kept on this browser into a new account', async () => {
    const { context, page } = await freshPage();
    const other = `units-old-${randomUUID().slice(0, 8)}@quillmoss.example`;
    await context.request.post('/api/auth/sign-up', {
      data: { email: other, password: PASSWORD, name: 'Old Browser' },
    });
    const me = (await (await context.request.get('/api/me')).json()) as { user: { id: string } };
    await page.goto('/');
    await page.evaluate((id) => window.localStorage.setItem(`seamwright.units.${id}`, 'in'), me.user.id);
    await page.goto('/design');
    await poll(() => page.getByRole('radio', { name: 'Inches' }).isChecked()).toBe(true);
    await poll(() => accountUnits(context)).toBe('in');
    expect(await page.evaluate((id) => window.localStorage.getItem(`seamwright.units.${id}`), me.user.id)).toBeNull();
  });
});
