import { randomUUID } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { APIResponse, BrowserContext, Locator, Page } from 'playwright-core';
import { screenshot, seriousAxeViolations, useBrowserApp } from '../helpers/browser';

// The team library's own pages driven through the UI: materials, kit history, printers, and the presets
// list from the keyboard alone. The owner of a personal team has every editor right.
const app = useBrowserApp();

const run = randomUUID().slice(0, 8);
const names = {
  preset: `Gauntlet cuff ${run}`,
  printer: `Lantern bench ${run}`,
  material: `Fern matte PETG ${run}`,
  newPrinter: `Sparrow resin ${run}`,
};

let context: BrowserContext;
let page: Page;

/** The reply's JSON body, or a failure naming the route and what it answered. */
async function ok(response: APIResponse): Promise<Record<string, unknown>> {
  if (!response.ok()) throw new Error(`${response.url()} answered ${response.status()}: ${await response.text()}`);
  const type = response.headers()['content-type'] ?? '';
  return type.includes('json') ? ((await response.json()) as Record<string, unknown>) : {};
}

/** True when the element draws a focus indicator: an outline that is not "none", or a ring (box-shadow). */
function focusIndicator(locator: Locator): Promise<{ outline: string; shadow: string; visible: boolean }> {
  return locator.evaluate((el) => {
    const style = getComputedStyle(el);
    const outline = `${style.outlineStyle} ${style.outlineWidth} ${style.outlineColor}`;
    const hasOutline = style.outlineStyle !== 'none' && parseFloat(style.outlineWidth) > 0;
    return { outline, shadow: style.boxShadow, visible: hasOutline || style.boxShadow !== 'none' };
  });
}

/** Presses Tab until `target` has focus; fails after `limit` presses. */
async function tabTo(target: Locator, limit = 60) {
  for (let i = 0; i < limit; i += 1) {
    await page.keyboard.press('Tab');
    if (await target.evaluate((el) => el === document.activeElement)) return;
  }
  throw new Error(`Tab never reached ${target.toString()} in ${limit} presses`);
}

beforeAll(async () => {
  context = await app.newContext();
  const api = context.request;
  const email = `e2e-library-pages-${run}@quillmoss.example`;
  await ok(
    await api.post('/api/auth/sign-up', { data: { email, password: 'alder-rasp-vise-31', name: 'Ione Marsh' } }),
  );
  const me = (await ok(await api.get('/api/me'))) as { teams: { id: string }[] };
  const base = `/api/teams/${me.teams[0]!.id}`;
  const profile = await ok(
    await api.post(`${base}/printer-profiles`, {
      data: {
        name: names.printer,
        process: 'fdm',
        buildVolume: { x: 250, y: 210, z: 220 },
        nozzleDiameter: 0.4,
        layerHeight: 0.2,
        calibration: [{ material: 'PLA', fit: 'snug', offsetMm: -0.03, measuredOn: '2026-10-02', source: 'fit test' }],
      },
    }),
  );
  const settings = { joint: 'key', material: 'PLA', fit: 'snug', key: { shape: 'round', width: 10, depth: 6 } };
  const preset = await ok(
    await api.post(`${base}/presets`, { data: { name: names.preset, printerProfileId: profile.id, settings } }),
  );
  await ok(
    await api.post(`${base}/kits`, {
      data: {
        request: { ...settings, face: { shape: 'rect', width: 70, height: 45 } },
        presetId: preset.id,
        printerProfileId: profile.id,
      },
    }),
  );
  page = await context.newPage();
  // Generous per step for a 2-core CI machine; every wait is for a visible state, never a fixed sleep.
  page.setDefaultTimeout(15_000);
});
afterAll(() => context?.close());

describe('library pages', () => {
  it('adds a team material, edits its snug adjustment, and explains a value out of range beside the field', async () => {
    await page.goto('/materials');
    const table = page.getByRole('table', { name: 'Team materials' });
    await page.getByText('No team materials yet.').waitFor();

    const add = page.getByRole('region', { name: 'Add a material' });
    await add.getByLabel('Name', { exact: true }).fill(names.material);
    await add.getByLabel('Base material').selectOption('PETG');
    await add.getByLabel('snug clearance adjustment, mm per side').fill('0.03');
    await add.getByRole('button', { name: 'Add material' }).click();
    const row = table.getByRole('row').filter({ hasText: names.material });
    await row.waitFor();
    expect(await row.innerText()).toContain('snug 0.03 mm');

    await row.getByRole('button', { name: `Edit ${names.material}` }).click();
    const edit = page.getByRole('region', { name: `Edit “${names.material}”` });
    const snug = edit.getByLabel('snug clearance adjustment, mm per side');
    // The edit form puts the cursor in the name field.
    await expect
      .poll(() => edit.getByLabel('Name', { exact: true }).evaluate((el) => el === document.activeElement))
      .toBe(true);
    await snug.fill('0.9');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    const message = 'snug clearance adjustment must be at most 0.5 mm; it is 0.9 mm';
    await edit.getByText(message).waitFor();
    // The message belongs to the field: it is marked invalid and described by the message.
    expect(await snug.getAttribute('aria-invalid')).toBe('true');
    const description = await snug.evaluate((el) =>
      (el.getAttribute('aria-describedby') ?? '')
        .split(' ')
        .map((id) => document.getElementById(id)?.textContent ?? '')
        .join(' '),
    );
    expect(description).toContain(message);
    expect(await row.innerText()).toContain('snug 0.03 mm');
    await screenshot(page, 'library-material-error');
    expect(await seriousAxeViolations(page)).toEqual([]);

    await snug.fill('0.12');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    await expect.poll(() => row.innerText(), { timeout: 15_000 }).toContain('snug 0.12 mm');
    await expect.poll(() => edit.count()).toBe(0);
    await page.getByRole('region', { name: 'Add a material' }).waitFor();

    // A refused change shows at once and rolls back: the server's answer is held until the table shows it.
    let release: () => void = () => {};
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route('**/api/teams/*/materials/*', async (route) => {
      if (route.request().method() !== 'PATCH') return route.continue();
      await held;
      await route.fulfill({
        status: 503,
        json: { error: { code: 'SERVICE_UNAVAILABLE', message: 'The library is being moved; try again in a minute.' } },
      });
    });
    await row.getByRole('button', { name: `Edit ${names.material}` }).click();
    await snug.fill('0.2');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    await expect.poll(() => row.innerText()).toContain('snug 0.2 mm');
    release();
    await edit.getByText('The library is being moved; try again in a minute.').waitFor();
    await expect.poll(() => row.innerText()).toContain('snug 0.12 mm');
    await page.unroute('**/api/teams/*/materials/*');
  }, 60_000);

  it('lists the recorded kit with its preset and printer and downloads it again byte-identical', async () => {
    await page.goto('/kits');
    const row = page.getByRole('table', { name: 'Kit history' }).getByRole('row').filter({ hasText: names.preset });
    await row.waitFor();
    const text = await row.innerText();
    expect(text).toContain(`${names.preset} v1`);
    expect(text).toContain(names.printer);

    await row.getByRole('button', { name: 'Check and download' }).click();
    const result = page.getByRole('status').filter({ hasText: 'byte-identical' });
    await result.waitFor({ timeout: 30_000 });
    expect(await result.innerText()).toMatch(/all \d+ STL files are byte-identical to the original download/);
    await screenshot(page, 'library-kit-check');
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      result.getByRole('button', { name: 'Download again' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.zip$/);
    const bytes = await readFile((await download.path())!);
    // A zip starts with the local file header signature "PK\x03\x04".
    expect(bytes.subarray(0, 4)).toEqual(Buffer.from([0x50, 0x4b, 0x03, 0x04]));
  }, 60_000);

  it('creates a printer profile with a calibration entry and lists it', async () => {
    await page.goto('/printers');
    const table = page.getByRole('table', { name: 'Printer profiles' });
    await table.getByRole('row').filter({ hasText: names.printer }).waitFor();
    await page.getByRole('button', { name: 'New printer profile' }).click();
    const form = page.getByRole('region', { name: 'New printer profile' });
    await form.getByLabel('Name', { exact: true }).fill(names.newPrinter);
    await form.getByLabel('Process').selectOption('resin');
    await expect.poll(() => form.getByLabel('Nozzle diameter, mm').count()).toBe(0);
    await form.getByLabel('Layer height, mm').fill('0.05');
    await form.getByRole('button', { name: 'Add a calibration entry' }).click();
    await form.getByLabel('Fit', { exact: true }).selectOption('slide');
    await form.getByLabel('Offset, mm per side').fill('0.04');
    await form.getByRole('button', { name: 'Save printer profile' }).click();

    const row = table.getByRole('row').filter({ hasText: names.newPrinter });
    await row.waitFor();
    await expect.poll(() => form.count()).toBe(0);
    const text = await row.innerText();
    expect(text).toContain('Resin');
    expect(text).toMatch(/resin-standard slide \+0\.04 mm/);
    await screenshot(page, 'library-printers');
    expect(await seriousAxeViolations(page)).toEqual([]);
  }, 60_000);

  it('lets the presets list be searched and opened from the keyboard alone, with focus always visible', async () => {
    await page.goto('/presets');
    const link = page.getByRole('table', { name: 'Presets' }).getByRole('link', { name: names.preset });
    await link.waitFor();
    const search = page.getByRole('searchbox', { name: 'Search' });

    await tabTo(search);
    const searchFocus = await focusIndicator(search);
    expect(searchFocus.visible, `search field: ${JSON.stringify(searchFocus)}`).toBe(true);
    await page.keyboard.type(names.preset.split(' ')[0]!);
    await expect
      .poll(() => page.getByRole('table', { name: 'Presets' }).getByRole('link').count(), { timeout: 15_000 })
      .toBe(1);

    await tabTo(link);
    const linkFocus = await focusIndicator(link);
    expect(linkFocus.visible, `preset link: ${JSON.stringify(linkFocus)}`).toBe(true);
    await screenshot(page, 'library-presets-keyboard');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/presets\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { level: 1, name: names.preset }).waitFor();
  }, 60_000);
});
