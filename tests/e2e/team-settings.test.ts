import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { meSchema } from '../../shared/schemas/account';
import { teamSummarySchema } from '../../shared/schemas/team';
import { screenshot, seriousAxeViolations, useBrowserApp } from '../helpers/browser';

// An owner renames a shared team and deletes it; a personal team cannot be deleted.
const app = useBrowserApp();
let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  context = await app.newContext();
  const email = `e2e-team-${Date.now().toString(36)}@quillmoss.example`;
  const signUp = await context.request.post('/api/auth/sign-up', {
    data: { email, password: 'lantern-rasp-file-31', name: 'Ione Marsh' },
  });
  expect(signUp.status()).toBe(201);
  const made = await context.request.post('/api/teams', { data: { name: 'Lantern Works' } });
  expect(made.status()).toBe(201);
  const team = teamSummarySchema.parse(await made.json());
  page = await context.newPage();
  page.setDefaultTimeout(10_000);
  await page.goto('/team');
  await page.getByRole('banner').getByLabel('Team', { exact: true }).selectOption(team.id);
  await page.getByRole('heading', { level: 1, name: 'Lantern Works' }).waitFor();
});
afterAll(() => context?.close());

describe('team settings', () => {
  it('renames the team and the header follows', async () => {
    await page.getByLabel('Team name', { exact: true }).fill('Lantern Works Annex');
    await page.getByRole('button', { name: 'Rename' }).click();
    await page.getByRole('heading', { level: 1, name: 'Lantern Works Annex' }).waitFor();
    await expect
      .poll(() => page.getByRole('banner').getByRole('option', { name: 'Lantern Works Annex (owner)' }).count())
      .toBe(1);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'team-settings');
  });

  it('deletes the team only after its name is typed, then shows the personal team', async () => {
    const remove = page.getByRole('button', { name: 'Delete Lantern Works Annex' });
    expect(await remove.isDisabled()).toBe(true);
    await page.getByLabel('Type the team’s name to confirm').fill('Lantern Works Annex');
    await remove.click();
    await page.getByRole('heading', { level: 1, name: 'Ione Marsh’s workshop'.replace('’', "'") }).waitFor();
    const me = meSchema.parse(await (await context.request.get('/api/me')).json());
    expect(me.teams.map((t) => t.name)).toEqual(["Ione Marsh's workshop"]);
    // A personal team has no delete button, only the rename form.
    expect(await page.getByRole('button', { name: /^Delete / }).count()).toBe(0);
    expect(await page.getByText('This is your personal team').count()).toBe(1);
  });
});
