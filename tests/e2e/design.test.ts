import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import JSZip from 'jszip';
import type { BrowserContext, Page } from 'playwright-core';
import { screenshot, useBrowserApp } from '../helpers/browser';
import { upToDate } from './design-page';
import { pixelsUnlike } from './canvas-pixels';

const app = useBrowserApp();
let context: BrowserContext;
let page: Page;

async function fill(p: Page, label: string, value: string) {
  const field = p.getByLabel(label, { exact: true });
  await field.fill(value);
}

beforeAll(async () => {
  context = await app.newContext();
  page = await context.newPage();
  await page.goto('/design');
  await upToDate(page);
});
afterAll(() => context?.close());

describe('design screen', () => {
  it('downloads a zip whose manifest matches the form when an anonymous user designs a key kit', async () => {
    await page.getByLabel('Key shape').selectOption('round');
    await fill(page, 'Face width (x)', '90');
    await fill(page, 'Key diameter', '8');
    await fill(page, 'How many', '6');
    await page.getByLabel('Printing process').selectOption('fdm');
    await page.getByLabel('Material', { exact: true }).selectOption('PETG');
    await page.getByText('Slide', { exact: true }).click();
    await upToDate(page);
    await expect.poll(() => page.getByTestId('kit-files').innerText()).toContain('print 6');
    const shownClearance = (await page.getByTestId('clearance').innerText()).match(/([\d.]+) mm/)?.[1];

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the kit (.zip)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^seamwright-key-kit-[0-9a-f]{8}\.zip$/);
    const zip = await JSZip.loadAsync(
      await (await download.createReadStream()).toArray().then((c) => Buffer.concat(c)),
    );
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    expect(manifest.request).toMatchObject({
      joint: 'key',
      material: 'PETG',
      process: 'fdm',
      fit: 'slide',
      face: { shape: 'rect', width: 90, height: 60 },
      key: { shape: 'round', width: 8, depth: 8, count: 6, margin: 2, strategy: 'clearance' },
    });
    expect(manifest.parts.map((p: { file: string }) => p.file)).toEqual([
      'key.stl',
      'pocket-cutter-A.stl',
      'pocket-cutter-B.stl',
    ]);
    expect(manifest.parts[0].quantity).toBe(6);
    expect(manifest.parts[1].positions).toHaveLength(6);
    expect(String(manifest.clearancePerSide)).toBe(shownClearance);
    expect(Object.keys(zip.files).sort()).toEqual([
      'README.txt',
      'key.stl',
      'manifest.json',
      'pocket-cutter-A.stl',
      'pocket-cutter-B.stl',
    ]);
    await screenshot(page, 'design-key-kit-desktop');
  });

  it('draws the kit on the canvas when the preview is built', async () => {
    const frame = page.getByTestId('preview-frame');
    const png = await frame.locator('canvas').screenshot();
    const { differing, total } = await pixelsUnlike(page, png, [0xe6, 0xe1, 0xd6]);
    // The halves, keys and pockets cover a good part of the view; an empty or black canvas would not.
    expect(differing / total).toBeGreaterThan(0.1);
    expect(differing / total).toBeLessThan(0.95);
  });

  it('labels the clearance when the view is cut through the keys', async () => {
    await page.getByRole('button', { name: 'Cut through' }).click();
    await expect.poll(() => page.getByTestId('section-label').innerText()).toMatch(/clearance [\d.]+ mm per side/);
    await page.waitForTimeout(300);
    await screenshot(page, 'design-section-view');
    await page.getByTestId('preview-frame').screenshot({ path: '.screenshots/design-section-close-up.png' });
    await page.getByRole('button', { name: 'Pulled apart' }).click();
    await page.waitForTimeout(300);
    await page.getByTestId('preview-frame').screenshot({ path: '.screenshots/design-exploded-view.png' });
    await page.getByRole('button', { name: 'Together' }).click();
  });

  it('keeps every value when the units switch from mm to inches and back', async () => {
    const faceWidth = page.getByLabel('Face width (x)', { exact: true });
    await faceWidth.fill('80');
    await page.getByText('Inches', { exact: true }).click();
    await expect.poll(() => faceWidth.inputValue()).toBe('3.1496');
    await expect.poll(() => page.getByLabel('Key diameter').inputValue()).toBe('0.315');
    await expect.poll(() => page.getByTestId('clearance').innerText()).toMatch(/ in$/);
    // A value typed in inches is stored in mm: 4 in = 101.6 mm.
    await page.getByLabel('Face height (y)').fill('4');
    await upToDate(page);
    await screenshot(page, 'design-inches');
    await page.reload();
    await upToDate(page);
    // The choice of unit is remembered on this browser.
    await expect.poll(() => page.getByLabel('Inches').isChecked()).toBe(true);
    await page.getByText('Millimetres', { exact: true }).click();
    await expect.poll(() => page.getByLabel('Face width (x)', { exact: true }).inputValue()).toBe('80');
    await page.getByLabel('Face height (y)').fill('101.6');
    await page.getByText('Inches', { exact: true }).click();
    await expect.poll(() => page.getByLabel('Face height (y)').inputValue()).toBe('4');
    await page.getByText('Millimetres', { exact: true }).click();
    await expect.poll(() => page.getByLabel('Face height (y)').inputValue()).toBe('101.6');
  });

  it('shows why when the keys do not fit and a field error when a value is out of range', async () => {
    await page.getByLabel('How many').fill('64');
    await expect.poll(() => page.getByTestId('fit-failure').innerText(), { timeout: 20_000 }).toMatch(/does not fit/i);
    await page.getByLabel('How many').fill('0');
    await expect.poll(() => page.getByText('key count must be at least 1; it is 0').count()).toBe(1);
    await page.getByLabel('How many').fill('8');
    await upToDate(page);
  });

  it('stacks the preview under the form on a 390 px phone', async () => {
    const phone = await app.newContext({ width: 390, height: 844 });
    const p = await phone.newPage();
    await p.goto('/design');
    await upToDate(p);
    const form = await p.getByRole('form', { name: 'Joint settings' }).boundingBox();
    const preview = await p.getByTestId('preview-frame').boundingBox();
    expect(preview!.y).toBeGreaterThan(form!.y + form!.height);
    expect(preview!.width).toBeLessThanOrEqual(390);
    await screenshot(p, 'design-phone');
    await phone.close();
  });
});

describe('ready-made setups', () => {
  it('fills the whole form, face included, without an account', async () => {
    const p = await context.newPage();
    await p.goto('/design');
    await upToDate(p);
    await p.getByLabel('Start from a ready-made setup').selectOption({ label: 'Removable display base' });
    await p.getByRole('button', { name: 'Use this setup' }).click();
    await expect.poll(() => p.getByLabel('Face width (x)').inputValue()).toBe('120');
    expect(await p.getByLabel('Material', { exact: true }).inputValue()).toBe('PETG');
    expect(await p.getByRole('radio', { name: /Sliding dovetail/ }).isChecked()).toBe(true);
    await upToDate(p);
    await expect.poll(() => p.getByTestId('kit-files').textContent()).toContain('rail-A.stl');
    await p.close();
  }, 60_000);
});

describe('dovetail preview', () => {
  // The preview's update time is measured by `npm run bench` (tests/bench/preview-bench.ts), not here.
  it('draws a dovetail kit when the joint changes', async () => {
    const p = await context.newPage();
    await p.goto('/design');
    await upToDate(p);
    await p.getByText('Sliding dovetail', { exact: true }).click();
    await p.getByLabel('Face width (x)').fill('90');
    await upToDate(p);
    const frame = p.getByTestId('preview-frame');
    const png = await frame.locator('canvas').screenshot({ path: '.screenshots/design-dovetail-preview.png' });
    const { differing, total } = await pixelsUnlike(p, png, [0xe6, 0xe1, 0xd6]);
    expect(differing / total).toBeGreaterThan(0.1);
    await screenshot(p, 'design-dovetail');
    await p.close();
  }, 60_000);
});

describe('design screen, signed in', () => {
  it('records the downloaded kit in the current team’s kit history', async () => {
    const member = await app.newContext();
    const email = `e2e-record-${Date.now().toString(36)}@quillmoss.example`;
    const signUp = await member.request.post('/api/auth/sign-up', {
      data: { email, password: 'walnut-dowel-clamp-77', name: 'Bench Recorder' },
    });
    expect(signUp.status()).toBe(201);
    const me = await (await member.request.get('/api/me')).json();
    const teamId = me.teams[0].id as string;
    const p = await member.newPage();
    await p.goto('/design');
    await upToDate(p);
    await expect.poll(() => p.getByText('Each download is kept in the kit history').count()).toBe(1);
    const [download] = await Promise.all([
      p.waitForEvent('download'),
      p.getByRole('button', { name: 'Download the kit (.zip)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/^seamwright-key-kit-[0-9a-f]{8}\.zip$/);
    const history = await (await member.request.get(`/api/teams/${teamId}/kits`)).json();
    expect(history.items).toHaveLength(1);
    await member.close();
  });
});
