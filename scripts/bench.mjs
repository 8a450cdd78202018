// `npm run bench`: installs what is missing, then measures the speed targets (reported, not asserted):
// 1. the joint engine (tests/bench/run-bench.ts, no database needed);
// 2. 50 kit downloads at once against a real server while /api/health is timed (tests/bench/load-bench.ts);
// 3. the design screen's preview update time in Debian's Chromium (tests/bench/preview-bench.ts), which
//    needs the local PostgreSQL, Chromium and a client build, set up here like `npm test` does.
//    `npm run bench -- --engine` skips both; `-- --load` runs the engine and load parts only.
import { spawnSync } from 'node:child_process';
import { bootstrap } from './lib/bootstrap.mjs';
import { buildClient } from './lib/build-client.mjs';
import { ensureChromium } from './lib/chromium.mjs';
import { ensureDependencies } from './lib/ensure-deps.mjs';
import { root } from './lib/paths.mjs';
import { runDbCli } from './lib/run-db-cli.mjs';

const run = (file, env = {}) =>
  spawnSync(process.execPath, ['--import', 'tsx', file], {
    cwd: root,
    stdio: 'inherit',
    env: { ...process.env, ...env },
  }).status ?? 1;

ensureDependencies();
let status = run('tests/bench/run-bench.ts');
if (status === 0 && !process.argv.includes('--engine')) {
  const url = await bootstrap(process.env.SEAMWRIGHT_BENCH_DB ?? 'seamwright_bench', { fresh: true });
  runDbCli('migrate', url);
  status = run('tests/bench/load-bench.ts', { DATABASE_URL: url });
}
if (status === 0 && !process.argv.includes('--engine') && !process.argv.includes('--load')) {
  const url = await bootstrap(process.env.SEAMWRIGHT_BENCH_DB ?? 'seamwright_bench');
  ensureChromium();
  process.env.SEAMWRIGHT_DIST ??= 'dist-bench';
  buildClient();
  status = run('tests/bench/preview-bench.ts', { DATABASE_URL: url, NODE_ENV: 'production', LOG_LEVEL: 'silent' });
}
process.exit(status);
