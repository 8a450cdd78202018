import { describe, expect, it } from 'vitest';
import { useBrowserApp } from '../helpers/browser';

const app = useBrowserApp();

describe('an anonymous visit', () => {
  it('logs no console error and no failed request on the public pages', async () => {
    const context = await app.newContext();
    const page = await context.newPage();
    const problems: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error') problems.push(`console: ${message.text()}`);
    });
    page.on('requestfailed', (request) => problems.push(`failed: ${request.url()}`));
    page.on('response', (response) => {
      if (response.status() >= 400) problems.push(`${response.status()}: ${response.url()}`);
    });
    for (const [path, ready] of [
      ['/', 'Join printed parts'],
      ['/design', 'Up to date.'],
      ['/sign-in', 'Sign in'],
    ] as const) {
      await page.goto(path);
      await page.getByText(ready).first().waitFor({ timeout: 20_000 });
      await page.waitForLoadState('networkidle');
    }
    await context.close();
    expect(problems).toEqual([]);
  });
});
