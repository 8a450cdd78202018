import { chromium, type Browser } from 'playwright-core';

/** Debian's Chromium (installed by `npm test` and `npm run bench` when missing; never downloaded). */
export const CHROMIUM = '/usr/bin/chromium';

// TOOLCHAIN.md: the flags that let Debian's Chromium render WebGL 2 through SwiftShader, headless. Playwright
// starts every launch with a fresh temporary profile (its own --user-data-dir).
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Starts Debian's Chromium, headless, with WebGL through SwiftShader. */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM, headless: true, args: CHROMIUM_ARGS });
}
