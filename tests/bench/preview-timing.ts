import type { Page } from 'playwright-core';

/** One preview update, from the page's performance marks (ms). */
export interface PreviewTiming {
  /** The browser's input event → the new solids drawn on the canvas. */
  readonly fromInput: number;
  /** The form's change → drawn (the `seamwright:preview-update` measure). */
  readonly shown: number;
  /** Building the solids in the worker. */
  readonly worker: number;
  /** The worker's reply received → drawn. */
  readonly page: number;
}

async function waitForCount(p: Page, name: string, above: number, timeoutMs = 20_000) {
  const until = Date.now() + timeoutMs;
  while ((await p.evaluate((n) => performance.getEntriesByName(n).length, name)) <= above) {
    if (Date.now() > until) throw new Error(`no new ${name} within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 5));
  }
}

/**
 * Types each value into a field of the design screen and reads the performance marks the preview leaves
 * for the build it triggers (src/features/design: `seamwright:input`, `…:preview-update`, `…:worker-build`,
 * `…:received:<id>`).
 */
export async function timeEdits(p: Page, label: string, values: readonly string[]): Promise<PreviewTiming[]> {
  const results: PreviewTiming[] = [];
  for (const value of values) {
    const before = await p.evaluate(() => performance.getEntriesByName('seamwright:preview-update').length);
    await p.evaluate(() =>
      document.addEventListener('input', () => performance.mark('seamwright:input'), { capture: true, once: true }),
    );
    await p.getByLabel(label, { exact: true }).fill(value);
    await waitForCount(p, 'seamwright:preview-update', before);
    results.push(
      await p.evaluate(() => {
        const shown = performance.getEntriesByName('seamwright:preview-update').at(-1)!;
        const input = performance.getEntriesByName('seamwright:input').at(-1)!;
        const worker = performance.getEntriesByName('seamwright:worker-build').at(-1)!;
        const received = performance
          .getEntriesByType('mark')
          .filter((m) => m.name.startsWith('seamwright:received:'))
          .at(-1)!;
        const end = shown.startTime + shown.duration;
        return {
          shown: shown.duration,
          fromInput: end - input.startTime,
          worker: worker.duration,
          page: end - received.startTime,
        };
      }),
    );
  }
  return results;
}

const median = (xs: number[]) => xs.toSorted((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const p90 = (xs: number[]) => xs.toSorted((a, b) => a - b)[Math.floor(xs.length * 0.9)]!;

/** "median x ms, p90 y ms, max z ms" of one measure over the edits. */
export function summarize(timings: PreviewTiming[], pick: (t: PreviewTiming) => number): string {
  const xs = timings.map(pick);
  return `median ${median(xs).toFixed(1)} ms, p90 ${p90(xs).toFixed(1)} ms, max ${Math.max(...xs).toFixed(1)} ms`;
}

/** The median of one measure, for comparing with the target. */
export const medianOf = (timings: PreviewTiming[], pick: (t: PreviewTiming) => number) => median(timings.map(pick));
