// Builds the client into dist/ with Vite (SEAMWRIGHT_DIST names another folder, so parallel test runs of
// browser tests do not overwrite each other's build).
import { spawnSync } from 'node:child_process';
import { root } from './paths.mjs';
import { fail, say } from './log.mjs';

export function buildClient() {
  say('building the client (vite build)…');
  const r = spawnSync(
    process.execPath,
    [
      'node_modules/vite/bin/vite.js',
      'build',
      '--logLevel',
      'warn',
      '--outDir',
      process.env.SEAMWRIGHT_DIST ?? 'dist',
      '--emptyOutDir',
    ],
    {
      cwd: root,
      stdio: 'inherit',
    },
  );
  if (r.status !== 0) fail('the client build failed; see the messages above.');
}
