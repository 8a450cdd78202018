// Installs npm dependencies when node_modules is missing or older than the lock file.
import { existsSync, statSync } from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { lockFile, nodeModules, root } from './paths.mjs';
import { fail, say } from './log.mjs';

// npm writes this file on every install; its mtime says when node_modules last matched the lock.
const installMarker = path.join(nodeModules, '.package-lock.json');

export function ensureDependencies() {
  const fresh = existsSync(installMarker) && statSync(installMarker).mtimeMs >= statSync(lockFile).mtimeMs;
  if (fresh) return;
  say('installing dependencies (npm ci)…');
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) fail('npm ci failed; see the messages above.');
}
