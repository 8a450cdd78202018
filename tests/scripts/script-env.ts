// Shared by the tests of scripts/: where the checkout is, and the environment a script started by a test
// may inherit (without what `npm test` and vitest set for the suite: its database, NODE_ENV=test, silent
// logs, vitest's own markers), so the script behaves as it does when a person types the command.
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** The checkout these tests belong to, wherever it was cloned. */
export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

const suiteOnly = new Set([
  'NODE_ENV',
  'DATABASE_URL',
  'SEAMWRIGHT_DB_ADMIN_URL',
  'SEAMWRIGHT_DB_PORT',
  'SEAMWRIGHT_TEST_DB',
  'SEAMWRIGHT_DIST',
  'LOG_LEVEL',
  'HOST',
  'PORT',
  'APP_URL',
  'MAIL_CATCHER',
  'TEST',
]);

/** process.env without the suite's settings, plus `extra`. */
export function scriptEnv(extra: Record<string, string>): NodeJS.ProcessEnv {
  const inherited = Object.entries(process.env).filter(
    ([key]) => !suiteOnly.has(key) && !key.startsWith('VITEST') && !key.startsWith('SMTP_'),
  );
  return { ...Object.fromEntries(inherited), ...extra };
}
