// Debian's Chromium for the browser tests: installed with apt-get when missing (never downloaded by a
// test tool), and the choice of which test runs need it.
import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { fail, say } from './log.mjs';

export const chromiumPath = '/usr/bin/chromium';
const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** Installs the `chromium` package when /usr/bin/chromium is missing (as root); otherwise says how to. */
export function ensureChromium() {
  if (existsSync(chromiumPath)) return;
  if (!isRoot || !existsSync('/usr/bin/apt-get')) {
    fail(
      `The browser tests need Debian's Chromium at ${chromiumPath}. Install it once with ` +
        '`sudo apt-get install -y chromium` (or run `npm test` as root) and run the tests again.',
    );
  }
  say('installing Chromium from Debian packages for the browser tests (apt-get, about a minute)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', 'chromium']]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) fail(`apt-get ${args.join(' ')} failed; install the chromium package by hand.`);
  }
  if (!existsSync(chromiumPath)) fail(`the chromium package installed, but ${chromiumPath} is still missing.`);
}

/**
 * Whether a test run includes the browser tests: a run without file filters runs everything; otherwise
 * any filter that names tests/e2e (or the whole tests folder) does.
 */
export function runIncludesBrowserTests(args) {
  const filters = args.filter(
    (a, i) => !a.startsWith('-') && !(args[i - 1] ?? '').match(/^-(t|-testNamePattern|-project)$/),
  );
  return filters.length === 0 || filters.some((f) => /(^|\/)e2e(\/|$)|^tests\/?$|^\.\/?$/.test(f) || f.includes('e2e'));
}
