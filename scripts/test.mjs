// `npm test`: the same bootstrap into a fresh test database, then the whole suite, then one plain
// summary line "N passed, N failed" that CI reads (vitest's own summary is not read by CI).
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { bootstrap } from './lib/bootstrap.mjs';
import { buildClient } from './lib/build-client.mjs';
import { ensureChromium, runIncludesBrowserTests } from './lib/chromium.mjs';
import { databaseUrl, testDatabase } from './lib/db-settings.mjs';
import { dataDir, root } from './lib/paths.mjs';

const url = await bootstrap(testDatabase, { fresh: true });
// Browser tests drive Debian's Chromium against the real server serving the built client (dist/).
if (runIncludesBrowserTests(process.argv.slice(2))) {
  ensureChromium();
  buildClient();
}
const report = path.join(dataDir, `vitest-report-${testDatabase}.json`);
rmSync(report, { force: true });

const vitest = spawnSync(
  process.execPath,
  [
    'node_modules/vitest/vitest.mjs',
    'run',
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${report}`,
    ...process.argv.slice(2),
  ],
  {
    cwd: root,
    stdio: 'inherit',
    env: {
      ...process.env,
      NODE_ENV: 'test',
      DATABASE_URL: url,
      SEAMWRIGHT_DB_ADMIN_URL: databaseUrl('postgres'),
      LOG_LEVEL: 'silent',
    },
  },
);

let passed = 0;
let failed = 0;
if (existsSync(report)) {
  const results = JSON.parse(readFileSync(report, 'utf8'));
  passed = results.numPassedTests ?? 0;
  failed = results.numFailedTests ?? 0;
  // A file that fails to load has no failed test but a failed suite: count those too.
  if (vitest.status !== 0 && failed === 0) failed = results.numFailedTestSuites ?? 0;
}
const ok = vitest.status === 0 && failed === 0 && passed > 0;
if (!ok && failed === 0) failed = 1; // the runner itself crashed or ran nothing: never report green
process.stdout.write(`\n${passed} passed, ${failed} failed\n`);
process.exit(ok ? 0 : 1);
