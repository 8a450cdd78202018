// `npm run bench` (second part): the design screen's preview target — a parameter change shows the new
// solids within 50 ms for the reference kits — measured in Debian's Chromium with the page's performance
// marks, on the built client served by the real app. Reported, not asserted.
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { pino } from 'pino';
import { createApp } from '../../server/app';
import { createDatabase } from '../../server/db/client';
import { migrateDatabase } from '../../server/db/migrate';
import { launchChromium } from '../helpers/chromium-launch';
import { upToDate } from '../e2e/design-page';
import { medianOf, summarize, timeEdits, type PreviewTiming } from './preview-timing';

const TARGET_MS = 50;
const EDITS = 21;

const url = process.env.DATABASE_URL;
if (!url) throw new Error('run the preview benchmark with `npm run bench` (it sets DATABASE_URL)');
const clientDir = path.resolve(import.meta.dirname, '..', '..', process.env.SEAMWRIGHT_DIST ?? 'dist');

/** Alternating values, so every edit changes the kit. */
const cycle = (values: string[]) => Array.from({ length: EDITS }, (_, i) => values[i % values.length]!);

function report(name: string, timings: PreviewTiming[]) {
  const shown = medianOf(timings, (t) => t.fromInput);
  console.log(`\n${name} (${timings.length} edits)`);
  console.log(`  input → new solids drawn   ${summarize(timings, (t) => t.fromInput)}`);
  console.log(`  form change → drawn        ${summarize(timings, (t) => t.shown)}`);
  console.log(`  build in the worker        ${summarize(timings, (t) => t.worker)}`);
  console.log(`  reply received → drawn     ${summarize(timings, (t) => t.page)}`);
  console.log(`  target ≤ ${TARGET_MS} ms (median, input → drawn): ${shown <= TARGET_MS ? 'met' : 'NOT met'}`);
}

const { db, pool } = createDatabase(url);
await migrateDatabase(db);
const server = createServer(createApp({ db, logger: pino({ level: 'silent' }), clientDir }));
await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
const browser = await launchChromium();
try {
  const page = await browser.newPage({
    viewport: { width: 1280, height: 900 },
    baseURL: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
  });
  await page.goto('/design');
  await upToDate(page, 30_000);
  // Warm-up edits, not reported: the first builds also compile the page's and the worker's code.
  await timeEdits(page, 'Depth into each half', ['9', '7', '9', '7', '10']);
  console.log('Preview update time in Debian Chromium (software WebGL), the design screen as a visitor uses it:');
  report(
    '8 square 10 mm keys, 80 × 60 face',
    await timeEdits(page, 'Depth into each half', cycle(['6', '7', '8', '9'])),
  );
  // The section view clips every solid twice (faces and cut surfaces): the same kit, cut through a key.
  await page.getByRole('button', { name: 'Cut through' }).click();
  await page.getByLabel('Depth into each half', { exact: true }).fill('10');
  await upToDate(page, 30_000);
  report(
    '8 square 10 mm keys, cut through a key',
    await timeEdits(page, 'Depth into each half', cycle(['6', '7', '8', '9'])),
  );
  await page.getByRole('button', { name: 'Together' }).click();
  await page.getByLabel('Key shape').selectOption('round');
  await page.getByLabel('Key diameter').fill('8');
  // Off the cycle's values, so its first edit changes the kit.
  await page.getByLabel('Depth into each half', { exact: true }).fill('10');
  await upToDate(page, 30_000);
  report('8 round 8 mm keys, 80 × 60 face', await timeEdits(page, 'Depth into each half', cycle(['6', '7', '8', '9'])));
  await page.getByText('Sliding dovetail', { exact: true }).click();
  await page.getByLabel('Face width (x)').fill('90');
  await page.getByLabel('Rail height', { exact: true }).fill('8');
  await upToDate(page, 30_000);
  report('3 dovetail rails, 90 × 60 face', await timeEdits(page, 'Rail height', cycle(['4', '5', '6', '7'])));
} finally {
  await browser.close();
  server.close();
  await pool.end();
}
