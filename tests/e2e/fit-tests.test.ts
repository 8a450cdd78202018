import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import JSZip from 'jszip';
import type { BrowserContext, Page } from 'playwright-core';
import { screenshot, seriousAxeViolations, useBrowserApp } from '../helpers/browser';

const app = useBrowserApp();
let context: BrowserContext;
let page: Page;
let teamId: string;
let profileId: string;

beforeAll(async () => {
  context = await app.newContext();
  const email = `e2e-${randomUUID().slice(0, 8)}@quillmoss.example`;
  const signUp = await context.request.post('/api/auth/sign-up', {
    data: { email, password: 'walnut-dowel-clamp-77', name: 'Bench Tester' },
  });
  expect(signUp.status()).toBe(201);
  const me = await (await context.request.get('/api/me')).json();
  teamId = me.teams[0].id;
  const created = await context.request.post(`/api/teams/${teamId}/printer-profiles`, {
    data: {
      name: 'Workshop bench printer',
      process: 'fdm',
      buildVolume: { x: 220, y: 220, z: 250 },
      nozzleDiameter: 0.4,
      layerHeight: 0.2,
      notes: '',
      calibration: [],
    },
  });
  expect(created.status(), await created.text()).toBe(201);
  profileId = (await created.json()).id;
  page = await context.newPage();
  page.setDefaultTimeout(15_000);
});
afterAll(() => context?.close());

describe('fit-test panel', () => {
  it('opens from the printer profiles table', async () => {
    await page.goto('/printers');
    await page.getByRole('link', { name: 'Fit tests of Workshop bench printer' }).click();
    await page.getByRole('heading', { name: 'Fit tests: Workshop bench printer' }).waitFor({ timeout: 20_000 });
    expect(page.url()).toContain(`/printers/${profileId}/fit-tests`);
  });

  it('downloads a coupon with one pocket per grade of the chosen range', async () => {
    await page.getByLabel('Material', { exact: true }).selectOption('PLA');
    await page.getByLabel('From, mm').fill('0.1');
    await page.getByLabel('To, mm').fill('0.3');
    await page.getByLabel('Step, mm').fill('0.1');
    await page.getByLabel('What the key did in pocket 3').waitFor();
    expect(await page.getByLabel(/What the key did in pocket/).count()).toBe(3);
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the coupon (.zip)' }).click(),
    ]);
    const zip = await JSZip.loadAsync(
      await (await download.createReadStream()).toArray().then((c) => Buffer.concat(c)),
    );
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    expect(
      manifest.pockets.map((p: { mark: string; clearancePerSide: number }) => [p.mark, p.clearancePerSide]),
    ).toEqual([
      ['1', 0.1],
      ['2', 0.2],
      ['3', 0.3],
    ]);
  });

  it('previews a contradiction, then saves the answers to the printer’s calibration', async () => {
    await page.getByLabel('What the key did in pocket 1').selectOption({ label: 'slid freely' });
    await page.getByLabel('What the key did in pocket 2').selectOption({ label: 'went in with force' });
    await expect.poll(() => page.getByTestId('fit-test-preview').innerText()).toContain('contradict');
    await expect.poll(() => page.getByRole('button', { name: 'Save to this printer' }).isDisabled()).toBe(true);

    await page.getByLabel('What the key did in pocket 1').selectOption({ label: 'went in with force' });
    await page.getByLabel('What the key did in pocket 2').selectOption({ label: 'snug' });
    await page.getByLabel('What the key did in pocket 3').selectOption({ label: 'slid freely' });
    await expect.poll(() => page.getByTestId('fit-test-preview').innerText()).toContain('Published default');
    await page.getByRole('button', { name: 'Save to this printer' }).click();
    await page.getByText('Saved: the fit engine now uses this calibration').waitFor({ timeout: 20_000 });
    await page.getByTestId('fit-test-history').getByText('Current for PLA').waitFor();
    await screenshot(page, 'printer-fit-tests');

    const tests = await (
      await context.request.get(`/api/teams/${teamId}/printer-profiles/${profileId}/fit-tests`)
    ).json();
    expect(tests.items).toHaveLength(1);
    const profile = await (await context.request.get(`/api/teams/${teamId}/printer-profiles/${profileId}`)).json();
    const entries = profile.calibration
      .filter((e: { material: string }) => e.material === 'PLA')
      .map((e: { fit: string; offsetMm: number; source: string }) => [e.fit, e.offsetMm, e.source]);
    expect(entries.map((e: unknown[]) => e[0]).sort()).toEqual(['press', 'slide', 'snug']);
    for (const entry of entries) expect(entry[2]).toBe(`fit test ${tests.items[0].id}`);
    const { results } = tests.items[0];
    expect(results.press.clearancePerSide).toBe(0.1);
    expect(results.snug.clearancePerSide).toBe(0.2);
    expect(results.slide.clearancePerSide).toBe(0.3);
    for (const [fit, offset] of entries) expect(offset).toBe(results[fit].offsetMm);
  });

  it('keeps the answers not saved yet over a reload, per printer, and forgets them once saved', async () => {
    const draftKey = `seamwright.fit-test-draft.${profileId}`;
    const stored = () => page.evaluate((key) => sessionStorage.getItem(key) ?? '', draftKey);
    await expect.poll(stored, { timeout: 15_000 }).toBe('');
    await page.getByLabel('Joint to test').selectOption('dovetail');
    await page.getByLabel('From, mm').fill('0.1');
    await page.getByLabel('To, mm').fill('0.3');
    await page.getByLabel('Step, mm').fill('0.1');
    await page.getByLabel('What the rail did in slot 1').selectOption({ label: 'went in with force' });
    await page.getByLabel('What the rail did in slot 2').selectOption({ label: 'snug' });
    await expect.poll(stored, { timeout: 15_000 }).toContain('"dovetail:2@0.2":"snug"');

    await page.reload();
    await page.getByLabel('What the rail did in slot 3').waitFor();
    await expect.poll(() => page.getByLabel('Joint to test').inputValue(), { timeout: 15_000 }).toBe('dovetail');
    expect(await page.getByLabel('From, mm').inputValue()).toBe('0.1');
    expect(await page.getByLabel('What the rail did in slot 1').inputValue()).toBe('forced');
    expect(await page.getByLabel('What the rail did in slot 2').inputValue()).toBe('snug');
    expect(await page.getByLabel('What the rail did in slot 3').inputValue()).toBe('');

    // An accidental trip away and back keeps them too.
    await page.getByRole('link', { name: 'Back to the printer profiles' }).click();
    await page.getByRole('link', { name: 'Fit tests of Workshop bench printer' }).click();
    await page.getByLabel('What the rail did in slot 2').waitFor();
    await expect
      .poll(() => page.getByLabel('What the rail did in slot 2').inputValue(), { timeout: 15_000 })
      .toBe('snug');
  });

  it('downloads a dovetail coupon: a slot block and a rail, one slot per grade', async () => {
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Download the coupon (.zip)' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.zip$/);
    const zip = await JSZip.loadAsync(
      await (await download.createReadStream()).toArray().then((c) => Buffer.concat(c)),
    );
    expect(Object.keys(zip.files)).toEqual(expect.arrayContaining(['slot-block.stl', 'rail.stl', 'manifest.json']));
    const manifest = JSON.parse(await zip.file('manifest.json')!.async('string'));
    expect(manifest.request.joint).toBe('dovetail');
    expect(manifest.request.dovetail).toMatchObject({ rootWidth: 8, height: 5, slope: 6 });
    expect(manifest.pockets.map((p: { clearancePerSide: number }) => p.clearancePerSide)).toEqual([0.1, 0.2, 0.3]);
  });

  it('saves the dovetail answers as a dovetail fit test and forgets the draft', async () => {
    await page.getByLabel('What the rail did in slot 3').selectOption({ label: 'slid freely' });
    await expect
      .poll(() => page.getByTestId('fit-test-preview').innerText(), { timeout: 15_000 })
      .toContain('(slot 3)');
    await page.getByRole('button', { name: 'Save to this printer' }).click();
    await page.getByText('Saved: the fit engine now uses this calibration').waitFor({ timeout: 20_000 });
    await expect
      .poll(() => page.evaluate((id) => sessionStorage.getItem(`seamwright.fit-test-draft.${id}`), profileId), {
        timeout: 15_000,
      })
      .toBeNull();

    const tests = await (
      await context.request.get(`/api/teams/${teamId}/printer-profiles/${profileId}/fit-tests`)
    ).json();
    expect(tests.items).toHaveLength(2);
    const [newest] = tests.items;
    expect(newest.joint).toBe('dovetail');
    expect(newest.coupon.request.joint).toBe('dovetail');
    expect(newest.answers.map((a: { mark: string; outcome: string }) => [a.mark, a.outcome])).toEqual([
      ['1', 'forced'],
      ['2', 'snug'],
      ['3', 'free'],
    ]);
    expect(newest.current).toBe(true);

    // Saved: a reload starts a new test from the defaults.
    await page.reload();
    await page.getByLabel('What the key did in pocket 1').waitFor();
    expect(await page.getByLabel('Joint to test').inputValue()).toBe('key');
  });

  it('has no serious or critical axe violations', async () => {
    await page.waitForLoadState('networkidle');
    expect(await seriousAxeViolations(page)).toEqual([]);
  });
});
