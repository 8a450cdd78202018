import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { screenshot, useBrowserApp } from '../helpers/browser';
import { upToDate } from './design-page';
import { pixelsUnlike } from './canvas-pixels';

const app = useBrowserApp();
let context: BrowserContext;
let page: Page;

const BACKGROUND: [number, number, number] = [0xe6, 0xe1, 0xd6];
// The section's flat fills (src/features/design/components/preview/preview-colors.ts).
const FILLS: Record<string, [number, number, number]> = {
  empty: BACKGROUND,
  A: [0x3f, 0x5f, 0x72],
  B: [0xa8, 0x6f, 0x44],
  key: [0x3d, 0x6a, 0x4c],
};

/** Where the gap pin points, in canvas pixels: GapPin moves the label with `translate(x px, y px)`. */
async function gapPoint(p: Page): Promise<{ x: number; y: number }> {
  const pin = p.getByTestId('section-gap-label');
  await expect.poll(() => pin.evaluate((el) => getComputedStyle(el).visibility)).toBe('visible');
  const transform = await pin.evaluate((el) => el.style.transform);
  const [, x, y] = transform.match(/translate\((-?\d+)px, (-?\d+)px\)/) ?? [];
  return { x: Number(x), y: Number(y) };
}

/**
 * The runs of section fills along one row of a PNG: each pixel goes to the nearest fill (or "other" when none is
 * within 24 per channel, as on shaded surfaces and anti-aliased edges), and equal neighbours are merged.
 */
async function fillRuns(p: Page, png: Buffer, row: number): Promise<Array<{ fill: string; from: number; to: number }>> {
  return p.evaluate(
    async ({ base64, y, fills }) => {
      const bytes = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
      const bitmap = await createImageBitmap(new Blob([bytes], { type: 'image/png' }));
      const canvas = new OffscreenCanvas(bitmap.width, bitmap.height);
      const ctx = canvas.getContext('2d')!;
      ctx.drawImage(bitmap, 0, 0);
      const data = ctx.getImageData(0, y, bitmap.width, 1).data;
      const runs: Array<{ fill: string; from: number; to: number }> = [];
      for (let x = 0; x < bitmap.width; x++) {
        const px = [data[x * 4]!, data[x * 4 + 1]!, data[x * 4 + 2]!];
        // The nearest fill within 24 per channel; the fills differ from each other by more than that.
        let fill = 'other';
        let best = 25;
        for (const [name, c] of Object.entries(fills)) {
          const off = Math.max(...c.map((v, i) => Math.abs(v - px[i]!)));
          if (off < best) [fill, best] = [name, off];
        }
        const last = runs.at(-1);
        if (last?.fill === fill) last.to = x;
        else runs.push({ fill, from: x, to: x });
      }
      // A speck (one or two pixels of anything else) between two runs of the same fill is an anti-aliased facet
      // edge on the far side of a cut solid: fold it into them.
      for (let i = runs.length - 2; i > 0; i--) {
        const [a, b, c] = [runs[i - 1]!, runs[i]!, runs[i + 1]!];
        if (a.fill === c.fill && b.to - b.from < 2) runs.splice(i - 1, 3, { fill: a.fill, from: a.from, to: c.to });
      }
      return runs;
    },
    { base64: png.toString('base64'), y: row, fills: FILLS },
  );
}

/** A screenshot of the canvas alone: the labels over it are hidden for the shot (GapPin shows the pin again when the gap moves). */
async function canvasShot(p: Page, path: string): Promise<Buffer> {
  const frame = p.getByTestId('preview-frame');
  await frame.screenshot({ path: path.replace(/\.png$/, '-labelled.png') });
  await p.getByTestId('section-gap-label').evaluate((el) => (el.style.visibility = 'hidden'));
  return frame.locator('canvas').screenshot({ path });
}

/** The fills met going right from the gap point and left from it: wall, gap, key (or rail). */
function around(runs: Array<{ fill: string; from: number; to: number }>, x: number) {
  const at = runs.findIndex((r) => r.from <= x && x <= r.to);
  const solid = (r: { fill: string }) => r.fill !== 'other';
  return {
    // Shown when an expectation fails: the runs around the gap point.
    near: `${x}: ${JSON.stringify(runs.slice(Math.max(0, at - 3), at + 4))}`,
    at: runs[at]!,
    right: runs.slice(at + 1).filter(solid)[0],
    left: runs.slice(0, at).filter(solid).at(-1),
  };
}

beforeAll(async () => {
  context = await app.newContext();
  page = await context.newPage();
  await page.goto('/design');
  await upToDate(page);
});
afterAll(() => context?.close());

describe('section view', () => {
  it('cuts through a key so the gap between key and pocket wall shows and is labelled', async () => {
    await page.getByRole('button', { name: 'Cut through' }).click();
    const clearance = (await page.getByTestId('section-label').innerText()).match(
      /clearance ([\d.]+) mm per side/,
    )?.[1];
    expect(clearance).toBeDefined();
    await expect.poll(() => page.getByTestId('section-gap-label').innerText()).toBe(`${clearance} mm gap`);
    await page.waitForTimeout(200);
    const gap = await gapPoint(page);
    await screenshot(page, 'section-view-keys-page');
    const png = await canvasShot(page, '.screenshots/section-view-keys.png');

    // The cut fills most of the view: the halves' walls and the key, not an empty or black canvas.
    const { differing, total } = await pixelsUnlike(page, png, BACKGROUND);
    expect(differing / total).toBeGreaterThan(0.5);
    // Along the row through the gap: key on one side, half A's cut wall on the other, the gap empty between.
    const { near, at, left, right } = around(await fillRuns(page, png, gap.y), gap.x);
    expect(at.fill, near).toBe('empty');
    expect(left?.fill, near).toBe('key');
    expect(right?.fill, near).toBe('A');
    // The key is cut solid: its fill runs on past the middle of the view (the PNG header holds the width at byte 16).
    expect(left!.from, near).toBeLessThan(png.readUInt32BE(16) / 2);
    // About 0.16 mm at the framing's scale: a few pixels, not a sliver of anti-aliasing and not a hole.
    expect(at.to - at.from + 1).toBeGreaterThanOrEqual(2);
    expect(at.to - at.from + 1).toBeLessThan(20);
  });

  it('cuts across a rail in its slot when the joint is a sliding dovetail', async () => {
    await page.getByText('Sliding dovetail', { exact: true }).click();
    await upToDate(page);
    await expect.poll(() => page.getByTestId('section-label').innerText()).toMatch(/through the rails/);
    await page.waitForTimeout(200);
    const gap = await gapPoint(page);
    const png = await canvasShot(page, '.screenshots/section-view-dovetail.png');
    const { near, at, left, right } = around(await fillRuns(page, png, gap.y), gap.x);
    expect(at.fill, near).toBe('empty');
    expect(left?.fill, near).toBe('key');
    expect(right?.fill, near).toBe('B');
    // The rail is cut solid, not drawn as an open shell: its fill runs on past the middle of the view.
    expect(left!.from, near).toBeLessThan(png.readUInt32BE(16) / 2);
  });
});
