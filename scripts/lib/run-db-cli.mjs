// Runs one command of server/db/cli.ts against a database URL.
import { spawnSync } from 'node:child_process';
import { root } from './paths.mjs';
import { fail } from './log.mjs';

export function runDbCli(command, databaseUrl) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'server/db/cli.ts', command], {
    cwd: root,
    stdio: 'inherit',
    env: { ...process.env, DATABASE_URL: databaseUrl },
  });
  if (r.status !== 0) fail(`database ${command} failed.`);
}
