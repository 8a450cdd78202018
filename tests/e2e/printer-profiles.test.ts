import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { seriousAxeViolations, useBrowserApp } from '../helpers/browser';

const app = useBrowserApp();
const run = randomUUID().slice(0, 6);
const name = `Attic resin printer ${run}`;
let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  context = await app.newContext();
  const signUp = await context.request.post('/api/auth/sign-up', {
    data: { email: `e2e-${run}@quillmoss.example`, password: 'walnut-dowel-clamp-77', name: 'Profile Tester' },
  });
  expect(signUp.status()).toBe(201);
  const me = await (await context.request.get('/api/me')).json();
  const created = await context.request.post(`/api/teams/${me.teams[0].id}/printer-profiles`, {
    data: {
      name,
      process: 'fdm',
      buildVolume: { x: 220, y: 220, z: 250 },
      nozzleDiameter: 0.4,
      layerHeight: 0.2,
      notes: '',
      calibration: [{ material: 'PLA', fit: 'snug', offsetMm: 0.02, measuredOn: '2026-01-12' }],
    },
  });
  expect(created.status(), await created.text()).toBe(201);
  page = await context.newPage();
  page.setDefaultTimeout(15_000);
});
afterAll(() => context?.close());

const row = () => page.getByRole('table', { name: 'Printer profiles' }).getByRole('row').filter({ hasText: name });
const editForm = () => page.getByRole('region', { name: `Edit ${name}` });

describe('printer profile edit', () => {
  it('links each calibration message to its own input', async () => {
    await page.goto('/printers');
    await row().getByRole('button', { name: 'Edit' }).click();
    const offset = editForm().getByLabel('Offset, mm per side');
    await offset.fill('0.9');
    await editForm().getByRole('button', { name: 'Save printer profile' }).click();
    await expect.poll(() => offset.getAttribute('aria-invalid'), { timeout: 15_000 }).toBe('true');
    const description = await offset.evaluate((el) =>
      (el.getAttribute('aria-describedby') ?? '')
        .split(' ')
        .map((id) => document.getElementById(id)?.textContent ?? '')
        .join(' '),
    );
    expect(description).toMatch(/0\.5 mm/);
    expect(await editForm().getByRole('alert').innerText()).toContain(description.trim());
    // The other inputs of the row are fine, and say so.
    expect(await editForm().getByLabel('Source').getAttribute('aria-invalid')).toBeNull();
    expect(await editForm().getByLabel('Source').getAttribute('aria-describedby')).toBeNull();
    expect(await seriousAxeViolations(page)).toEqual([]);
    await offset.fill('0.02');
    await expect.poll(() => offset.getAttribute('aria-invalid'), { timeout: 15_000 }).toBeNull();
    await editForm().getByRole('button', { name: 'Cancel' }).click();
  });

  it('shows a refused save at once, then puts the old values back with the server’s message', async () => {
    let release: () => void = () => {};
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route('**/api/teams/*/printer-profiles/*', async (route) => {
      if (route.request().method() !== 'PATCH') return route.continue();
      await held;
      await route.fulfill({
        status: 503,
        contentType: 'application/json',
        body: JSON.stringify({
          error: { code: 'SERVICE_UNAVAILABLE', message: 'The printer shelf is being moved; try again soon.' },
        }),
      });
    });
    await page.goto('/printers');
    await expect.poll(() => row().innerText(), { timeout: 15_000 }).toContain('0.4 mm / 0.2 mm');
    await row().getByRole('button', { name: 'Edit' }).click();
    await editForm().getByLabel('Layer height, mm').fill('0.12');
    await editForm().getByLabel('Offset, mm per side').fill('0.07');
    await editForm().getByRole('button', { name: 'Save printer profile' }).click();

    // While the server has not answered, the table already shows the change.
    await expect.poll(() => row().innerText(), { timeout: 15_000 }).toContain('0.4 mm / 0.12 mm');
    expect(await row().innerText()).toContain('PLA snug +0.07 mm');
    release();
    await editForm().getByText('The printer shelf is being moved; try again soon.').waitFor();
    await expect.poll(() => row().innerText(), { timeout: 15_000 }).toContain('0.4 mm / 0.2 mm');
    expect(await row().innerText()).toContain('PLA snug +0.02 mm');
    // The form keeps what was typed, to try again.
    expect(await editForm().getByLabel('Layer height, mm').inputValue()).toBe('0.12');
    await page.unroute('**/api/teams/*/printer-profiles/*');

    await editForm().getByRole('button', { name: 'Save printer profile' }).click();
    await expect.poll(() => editForm().count(), { timeout: 15_000 }).toBe(0);
    await expect.poll(() => row().innerText(), { timeout: 15_000 }).toContain('0.4 mm / 0.12 mm');
    expect(await row().innerText()).toContain('PLA snug +0.07 mm');
  });
});
