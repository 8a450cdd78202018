// `npm run bench`: installs what is missing, then runs the benchmark (no database needed).
import { spawnSync } from 'node:child_process';
import { ensureDependencies } from './lib/ensure-deps.mjs';
import { root } from './lib/paths.mjs';

ensureDependencies();
const r = spawnSync(process.execPath, ['--import', 'tsx', 'tests/bench/run-bench.ts'], { cwd: root, stdio: 'inherit' });
process.exit(r.status ?? 1);
