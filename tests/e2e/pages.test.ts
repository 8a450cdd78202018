import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { APIRequestContext, APIResponse, BrowserContext, Page } from 'playwright-core';
import { screenshot, seriousAxeViolations, useBrowserApp, type AxeProblem } from '../helpers/browser';

const app = useBrowserApp();

/** A page to check, and what to wait for before checking it (text, or an alert for error states). */
interface Target {
  path: string;
  name: string;
  ready?: string;
  alert?: boolean;
}

// Every screen a visitor can reach without an account.
const publicPages: Target[] = [
  { path: '/', name: 'home', ready: 'Join printed parts' },
  { path: '/design', name: 'design', ready: 'Up to date.' },
  { path: '/sign-in', name: 'sign-in' },
  { path: '/sign-up', name: 'sign-up' },
  { path: '/reset-password', name: 'reset-password' },
  { path: '/verify-email', name: 'verify-email' },
  { path: '/invitations/accept', name: 'accept-invitation' },
  { path: '/no-such-page', name: 'not-found', ready: 'Page not found' },
  // The member pages ask a visitor to sign in first.
  ...['team', 'account', 'presets', 'printers', 'materials', 'kits'].map((page) => ({
    path: `/${page}`,
    name: `${page}-signed-out`,
    ready: 'to see this page',
  })),
];

// An id no team has: the detail pages show their error state for it.
const MISSING_ID = '00000000-0000-4000-8000-000000000000';
const run = randomUUID().slice(0, 8);
const library = {
  preset: `Cowl seam ${run}`,
  printer: `Tinder bench ${run}`,
  material: `Slate matte PLA ${run}`,
};

/** The screens behind sign-in, for a team that has a preset, a printer, a team material and a recorded kit. */
function stockedPages(ids: { presetId: string; profileId: string }): Target[] {
  return [
    { path: '/', name: 'home-signed-in', ready: 'Join printed parts' },
    { path: '/design', name: 'design-signed-in', ready: 'Up to date.' },
    { path: '/team', name: 'team' },
    { path: '/account', name: 'account' },
    { path: '/presets', name: 'presets', ready: library.preset },
    { path: `/presets/${ids.presetId}`, name: 'preset-detail', ready: 'Version 1 (current)' },
    { path: '/printers', name: 'printers', ready: library.printer },
    { path: `/printers/${ids.profileId}/fit-tests`, name: 'fit-tests', ready: `Fit tests: ${library.printer}` },
    { path: '/materials', name: 'materials', ready: library.material },
    { path: '/kits', name: 'kits', ready: `${library.preset} v1` },
  ];
}

// The same screens for a fresh user's team: every table empty, every detail page missing.
const emptyPages: Target[] = [
  { path: '/presets', name: 'presets-empty', ready: 'No presets yet.' },
  { path: `/presets/${MISSING_ID}`, name: 'preset-detail-missing', alert: true },
  { path: '/printers', name: 'printers-empty', ready: 'No printer profiles yet.' },
  { path: `/printers/${MISSING_ID}/fit-tests`, name: 'fit-tests-missing', alert: true },
  { path: '/materials', name: 'materials-empty', ready: 'No team materials yet.' },
  { path: '/kits', name: 'kits-empty', ready: 'No kits recorded yet.' },
];

/** Opens the page, waits for its state, saves a screenshot and returns its serious axe violations. */
async function check(page: Page, target: Target): Promise<AxeProblem[]> {
  await page.goto(target.path);
  if (target.ready) await page.getByText(target.ready).first().waitFor({ timeout: 20_000 });
  if (target.alert) await page.getByRole('alert').first().waitFor({ timeout: 20_000 });
  await page.locator('h1').first().waitFor({ timeout: 20_000 });
  await page.waitForLoadState('networkidle');
  await screenshot(page, `page-${target.name}`);
  return (await seriousAxeViolations(page)).map((v) => ({ ...v, id: `${target.path}: ${v.id}` }));
}

/**
 * How far the page itself scrolls sideways beyond the viewport, in CSS px (0 when it fits), and the
 * outermost elements that stick out, to name in a failure.
 */
async function sidewaysOverflow(page: Page): Promise<{ extra: number; culprits: string[] }> {
  return page.evaluate(() => {
    const scroller = document.scrollingElement ?? document.documentElement;
    const extra = Math.max(0, scroller.scrollWidth - window.innerWidth);
    const sticksOut = (el: Element) => el.getBoundingClientRect().right > window.innerWidth + 1;
    // Inside a box that scrolls or clips sideways, and whose content it is (an absolutely placed element
    // escapes a box that is not its containing block): such an element cannot widen the page.
    const contained = (el: Element) => {
      const position = getComputedStyle(el).position;
      if (position === 'fixed') return false;
      let block = el.parentElement;
      // An absolutely placed element belongs to its nearest positioned ancestor.
      while (position === 'absolute' && block && getComputedStyle(block).position === 'static')
        block = block.parentElement;
      for (let a = el.parentElement; a && a !== document.body; a = a.parentElement) {
        if (getComputedStyle(a).overflowX !== 'visible' && (!block || a === block || a.contains(block))) return true;
      }
      return false;
    };
    const culprits = [...document.body.querySelectorAll('*')]
      .filter((el) => sticksOut(el) && !contained(el))
      // The outermost ones: their parent does not stick out itself.
      .filter((el) => !el.parentElement || !sticksOut(el.parentElement) || contained(el.parentElement))
      .slice(0, 3)
      .map((el) => `<${el.tagName.toLowerCase()} class="${el.getAttribute('class') ?? ''}">`);
    return { extra, culprits };
  });
}

/** The reply's JSON body, or a failure naming the route and what it answered. */
async function ok(response: APIResponse): Promise<Record<string, unknown>> {
  if (!response.ok()) throw new Error(`${response.url()} answered ${response.status()}: ${await response.text()}`);
  const type = response.headers()['content-type'] ?? '';
  return type.includes('json') ? ((await response.json()) as Record<string, unknown>) : {};
}

/** Signs a new user up in `context` and returns their personal team's id. */
async function signUp(context: BrowserContext, who: string): Promise<string> {
  const email = `e2e-${who}-${randomUUID().slice(0, 8)}@quillmoss.example`;
  await ok(
    await context.request.post('/api/auth/sign-up', {
      data: { email, password: 'walnut-dowel-clamp-77', name: 'Bench Tester' },
    }),
  );
  const me = (await ok(await context.request.get('/api/me'))) as { teams: { id: string }[] };
  return me.teams[0]!.id;
}

/** Fills the team with one of everything the library pages list. */
async function stockLibrary(api: APIRequestContext, teamId: string) {
  const base = `/api/teams/${teamId}`;
  const profile = await ok(
    await api.post(`${base}/printer-profiles`, {
      data: {
        name: library.printer,
        process: 'fdm',
        buildVolume: { x: 220, y: 220, z: 250 },
        nozzleDiameter: 0.4,
        layerHeight: 0.2,
        calibration: [{ material: 'PLA', fit: 'snug', offsetMm: -0.04, measuredOn: '2026-11-20', source: 'fit test' }],
      },
    }),
  );
  const material = await ok(
    await api.post(`${base}/materials`, {
      data: { name: library.material, baseMaterial: 'PLA', clearanceAdjustments: { press: 0, snug: 0.05, slide: 0 } },
    }),
  );
  const settings = { joint: 'key', material: 'PLA', fit: 'snug', key: { shape: 'square', width: 12, depth: 7 } };
  const preset = await ok(
    await api.post(`${base}/presets`, {
      data: { name: library.preset, printerProfileId: profile.id, tags: ['cowl'], settings },
    }),
  );
  await ok(
    await api.post(`${base}/kits`, {
      data: {
        request: { ...settings, face: { shape: 'rect', width: 60, height: 40 } },
        presetId: preset.id,
        printerProfileId: profile.id,
        teamMaterialId: material.id,
      },
    }),
  );
  return { presetId: preset.id as string, profileId: profile.id as string };
}

let visitor: BrowserContext;
let stocked: BrowserContext;
let fresh: BrowserContext;
let memberPages: Target[];
beforeAll(async () => {
  visitor = await app.newContext();
  stocked = await app.newContext();
  fresh = await app.newContext();
  memberPages = stockedPages(await stockLibrary(stocked.request, await signUp(stocked, 'stocked')));
  await signUp(fresh, 'fresh');
});
afterAll(async () => {
  await visitor?.close();
  await stocked?.close();
  await fresh?.close();
});

/** A page with a generous default wait, so a stuck locator fails with its name. */
async function newPage(context: BrowserContext): Promise<Page> {
  const page = await context.newPage();
  page.setDefaultTimeout(15_000);
  return page;
}

describe('every page', () => {
  it('has no serious or critical axe violations when nobody is signed in', async () => {
    const page = await newPage(visitor);
    const problems: AxeProblem[] = [];
    for (const target of publicPages) problems.push(...(await check(page, target)));
    expect(problems).toEqual([]);
    await page.close();
  }, 90_000);

  it('has no serious or critical axe violations when a member’s team has a library', async () => {
    const page = await newPage(stocked);
    const problems: AxeProblem[] = [];
    for (const target of memberPages) problems.push(...(await check(page, target)));
    expect(problems).toEqual([]);
    await page.close();
  }, 120_000);

  it('shows empty and missing states without serious or critical axe violations for a fresh team', async () => {
    const page = await newPage(fresh);
    const problems: AxeProblem[] = [];
    for (const target of emptyPages) problems.push(...(await check(page, target)));
    expect(problems).toEqual([]);
    await page.close();
  }, 90_000);
});

describe('every page on a 390 px phone', () => {
  const phone = { width: 390, height: 844 };

  /** Checks each target at phone size: axe, and no sideways scrolling of the page itself. */
  async function phonePass(context: BrowserContext, targets: Target[]) {
    const page = await newPage(context);
    await page.setViewportSize(phone);
    const problems: AxeProblem[] = [];
    const overflowing: string[] = [];
    for (const target of targets) {
      problems.push(...(await check(page, { ...target, name: `${target.name}-phone` })));
      const { extra, culprits } = await sidewaysOverflow(page);
      if (extra > 1) overflowing.push(`${target.path} is ${extra} px wider than the phone: ${culprits.join(', ')}`);
    }
    await page.close();
    return { problems, overflowing };
  }

  it('fits and passes axe when nobody is signed in', async () => {
    const { problems, overflowing } = await phonePass(visitor, publicPages);
    expect(problems).toEqual([]);
    expect(overflowing).toEqual([]);
  }, 90_000);

  it('fits and passes axe for a member’s team with a library', async () => {
    const { problems, overflowing } = await phonePass(stocked, memberPages);
    expect(problems).toEqual([]);
    expect(overflowing).toEqual([]);
  }, 120_000);

  it('fits and passes axe for a fresh team’s empty and missing states', async () => {
    const { problems, overflowing } = await phonePass(fresh, emptyPages);
    expect(problems).toEqual([]);
    expect(overflowing).toEqual([]);
  }, 90_000);
});
