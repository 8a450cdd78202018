import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { APIRequestContext, BrowserContext, Page } from 'playwright-core';
import type { z } from 'zod';
import { meSchema } from '../../shared/schemas/account';
import { teamMaterialSchema } from '../../shared/schemas/material';
import { kitHistoryPageSchema } from '../../shared/schemas/kit-history';
import { presetPageSchema, presetSchema } from '../../shared/schemas/preset';
import { presetVersionListSchema } from '../../shared/schemas/preset-version';
import { printerProfileSchema } from '../../shared/schemas/printer-profile';
import { screenshot, seriousAxeViolations, useBrowserApp } from '../helpers/browser';
import { upToDate } from './design-page';

// The design screen with a signed-in team: printer profiles feed the fit engine, presets load into the
// form and save back as new presets or versions, and a stale save keeps both versions.
const app = useBrowserApp();
let context: BrowserContext;
let api: APIRequestContext;
let page: Page;
let teamId: string;
let profileId: string;
let presetId: string;

/** The reply, checked against the API's own schema. */
async function json<S extends z.ZodType>(
  schema: S,
  response: Awaited<ReturnType<APIRequestContext['get']>>,
): Promise<z.output<S>> {
  if (!response.ok()) throw new Error(`${response.url()} answered ${response.status()}: ${await response.text()}`);
  return schema.parse(await response.json());
}

beforeAll(async () => {
  context = await app.newContext();
  api = context.request;
  const email = `e2e-library-${Date.now().toString(36)}@quillmoss.example`;
  await json(
    meSchema.pick({ user: true }),
    await api.post('/api/auth/sign-up', { data: { email, password: 'birch-jig-clamp-52', name: 'Wren Calder' } }),
  );
  teamId = (await json(meSchema, await api.get('/api/me'))).teams[0]!.id;
  profileId = (
    await json(
      printerProfileSchema,
      await api.post(`/api/teams/${teamId}/printer-profiles`, {
        data: {
          name: 'Corner FDM',
          process: 'fdm',
          buildVolume: { x: 220, y: 220, z: 250 },
          nozzleDiameter: 0.4,
          layerHeight: 0.2,
          calibration: [
            { material: 'PLA', fit: 'snug', offsetMm: -0.04, measuredOn: '2026-11-20', source: 'fit test' },
          ],
        },
      }),
    )
  ).id;
  await json(
    teamMaterialSchema,
    await api.post(`/api/teams/${teamId}/materials`, {
      data: { name: 'Chalk-white PLA', baseMaterial: 'PLA', clearanceAdjustments: { press: 0, snug: 0.05, slide: 0 } },
    }),
  );
  presetId = (
    await json(
      presetSchema,
      await api.post(`/api/teams/${teamId}/presets`, {
        data: {
          name: 'Mask brow seam',
          printerProfileId: profileId,
          settings: {
            joint: 'key',
            material: 'PLA',
            fit: 'snug',
            key: { shape: 'square', width: 12, depth: 7, count: 4 },
          },
        },
      }),
    )
  ).id;
  page = await context.newPage();
  await page.goto('/design');
  await upToDate(page);
});
afterAll(() => context?.close());

describe('design screen with a team library', () => {
  it('uses the chosen printer profile’s calibration in the fit explanation', async () => {
    await page.getByLabel('Printer profile').selectOption({ label: 'Corner FDM' });
    await expect.poll(() => page.getByTestId('printer-calibration').textContent()).toContain('−0.04 mm');
    // The fit explanation names the profile (in the derivation and its steps).
    await expect
      .poll(() => page.getByText('the calibration of printer profile "Corner FDM"').count())
      .toBeGreaterThan(0);
    // Printer correction is the profile's now; the typed field is gone.
    await expect.poll(() => page.getByLabel('Printer correction (optional)').count()).toBe(0);
    // A team material's adjustment replaces the catalogue's: 0.16 published + 0.05 − 0.04 = 0.17 mm.
    await page.getByLabel('Team material').selectOption({ label: 'Chalk-white PLA' });
    await expect.poll(() => page.getByTestId('clearance').textContent()).toContain('0.17 mm');
    await expect
      .poll(() => page.getByText('for Chalk-white PLA (a team material based on PLA)').count())
      .toBeGreaterThan(0);
    // Both the team material and the printer's calibration adjust the clearance: the form says so.
    await expect.poll(() => page.getByTestId('calibration-and-material').count()).toBe(1);
    await page.getByLabel('Material', { exact: true }).selectOption('PETG');
    await expect.poll(() => page.getByLabel('Team material').inputValue()).toBe('');
    await page.getByLabel('Material', { exact: true }).selectOption('PLA');
    await page.getByLabel('Printer profile').selectOption({ label: 'None: type a correction below' });
    await expect.poll(() => page.getByLabel('Printer correction (optional)').count()).toBe(1);
  });

  it('starts from a preset, saves a new version, and records downloads with the preset and printer', async () => {
    await page.getByLabel('Start from a preset').selectOption({ label: 'Mask brow seam (version 1)' });
    await page.getByRole('button', { name: 'Use this preset' }).click();
    await expect.poll(() => page.getByTestId('preset-origin').textContent()).toContain('version 1 — unchanged');
    // The number fields re-display a loaded value one render after the form changes.
    await expect.poll(() => page.getByLabel('Key width (x)').inputValue()).toBe('12');
    await expect.poll(() => page.getByLabel('Printer profile').inputValue()).toBe(profileId);
    await upToDate(page);

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the kit (.zip)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.zip$/);
    const history = await json(kitHistoryPageSchema, await api.get(`/api/teams/${teamId}/kits`));
    expect(history.items[0]).toMatchObject({ presetId, presetVersion: 1, printerProfileId: profileId });

    await page.getByLabel('Depth into each half').fill('9');
    await expect.poll(() => page.getByTestId('preset-origin').textContent()).toContain('changed since');
    await page.getByRole('button', { name: 'Save as version 2 of “Mask brow seam”' }).click();
    await expect.poll(() => page.getByText('Saved as version 2 of “Mask brow seam”.').count()).toBe(1);
    const saved = await json(presetSchema, await api.get(`/api/teams/${teamId}/presets/${presetId}`));
    expect(saved.version).toBe(2);
    expect(saved.settings).toMatchObject({ key: { depth: 9 } });
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, 'design-from-preset');
  });

  it('shows a stale save as a conflict and keeps both versions', async () => {
    // Someone else saves version 3 while this screen still works from version 2.
    await json(
      presetSchema,
      await api.patch(`/api/teams/${teamId}/presets/${presetId}`, {
        data: { baseVersion: 2, description: 'Deeper keys for the thicker brow.' },
      }),
    );
    await page.getByLabel('Wall around each pocket').fill('3');
    await page.getByRole('button', { name: 'Save as version 3 of “Mask brow seam”' }).click();
    await expect.poll(() => page.getByText('Someone saved version 3 of “Mask brow seam”').count()).toBe(1);
    await screenshot(page, 'design-preset-conflict');
    await page.getByRole('button', { name: 'Save mine as version 4' }).click();
    await expect.poll(() => page.getByText('Saved as version 4 of “Mask brow seam”.').count()).toBe(1);
    const versions = await json(
      presetVersionListSchema,
      await api.get(`/api/teams/${teamId}/presets/${presetId}/versions`),
    );
    expect(versions.items.map((v) => v.version)).toEqual([4, 3, 2, 1]);
    const current = await json(presetSchema, await api.get(`/api/teams/${teamId}/presets/${presetId}`));
    expect(current.description).toBe('Deeper keys for the thicker brow.');
    expect(current.settings).toMatchObject({ key: { margin: 3 } });
  });

  it('saves the design as a new preset without its face', async () => {
    await page.getByRole('button', { name: 'Save as a new preset…' }).click();
    await page.getByRole('button', { name: 'Save preset' }).click();
    await expect
      .poll(() => page.getByRole('form', { name: 'Save as a new preset' }).getByRole('alert').count())
      .toBe(1);
    await page.getByLabel('Preset name').fill('Mask brow seam, wide walls');
    await page.getByRole('button', { name: 'Save preset' }).click();
    await expect.poll(() => page.getByText('Saved as the new preset “Mask brow seam, wide walls”.').count()).toBe(1);
    const list = await json(presetPageSchema, await api.get(`/api/teams/${teamId}/presets?q=wide`));
    expect(list.items).toHaveLength(1);
    const made = await json(presetSchema, await api.get(`/api/teams/${teamId}/presets/${list.items[0]!.id}`));
    expect(made.settings).not.toHaveProperty('face');
    expect(made.printerProfileId).toBe(profileId);
  });

  it('opens a preset from a link', async () => {
    const p = await context.newPage();
    await p.goto(`/design?preset=${presetId}`);
    await expect.poll(() => p.getByTestId('preset-origin').textContent()).toContain('version 4');
    await expect.poll(() => p.getByLabel('Wall around each pocket').inputValue()).toBe('3');
    await p.close();
  });

  it('says so when the printer’s calibration changed after the page loaded, and follows it', async () => {
    await page.getByLabel('Printer profile').selectOption({ label: 'Corner FDM' });
    await upToDate(page);
    const before = await page.getByTestId('clearance').textContent();
    await json(
      printerProfileSchema,
      await api.patch(`/api/teams/${teamId}/printer-profiles/${profileId}`, {
        data: {
          calibration: [
            { material: 'PLA', fit: 'snug', offsetMm: -0.08, measuredOn: '2026-11-28', source: 'fit test' },
          ],
        },
      }),
    );
    await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the kit (.zip)' }).click(),
    ]);
    await expect.poll(() => page.getByText('changed since this page loaded').count(), { timeout: 15_000 }).toBe(1);
    await expect.poll(() => page.getByTestId('clearance').textContent(), { timeout: 15_000 }).not.toBe(before);
  });
});
