import type { Page } from 'playwright-core';

/** Waits until the design screen's preview shows a build of the form as it is now. */
export async function upToDate(p: Page, timeout = 20_000) {
  await p.getByTestId('preview-status').getByText('Up to date.').waitFor({ timeout });
}
