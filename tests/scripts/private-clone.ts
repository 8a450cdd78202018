// Helpers for the test of `npm start` from a clone in a private (0700) folder: making such a clone,
// free ports, and stopping and removing what a run there left behind.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import {
  chmodSync,
  cpSync,
  existsSync,
  mkdirSync,
  readFileSync,
  rmSync,
  statSync,
  symlinkSync,
  utimesSync,
  writeFileSync,
} from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { repoRoot, scriptEnv } from './script-env';

/**
 * Clones this checkout's committed tree into `dir`, then puts the working tree's scripts/ over it (so a
 * change to the scripts is tested before it is committed) and links node_modules to this checkout's.
 * The clone's lock file gets this checkout's lock file's time, which is what scripts/lib/ensure-deps.mjs
 * compares with node_modules; a stand-in `npm` on PATH (see `cloneEnv`) fails if it is called anyway,
 * so `npm ci` can never run through the link into the real node_modules.
 */
export function makeClone(dir: string): void {
  const clone = spawnSync('git', ['clone', '--quiet', repoRoot, dir], { encoding: 'utf8' });
  if (clone.status !== 0) throw new Error(`git clone failed: ${clone.stderr}`);
  rmSync(path.join(dir, 'scripts'), { recursive: true });
  cpSync(path.join(repoRoot, 'scripts'), path.join(dir, 'scripts'), { recursive: true });
  symlinkSync(path.join(repoRoot, 'node_modules'), path.join(dir, 'node_modules'), 'dir');
  const lock = statSync(path.join(repoRoot, 'package-lock.json'));
  utimesSync(path.join(dir, 'package-lock.json'), lock.atime, lock.mtime);
}

/** The environment for a script run in a clone: no suite settings, its own ports, a failing `npm`. */
export function cloneEnv(binDir: string, extra: Record<string, string>): NodeJS.ProcessEnv {
  mkdirSync(binDir, { recursive: true });
  const npm = path.join(binDir, 'npm');
  writeFileSync(npm, '#!/bin/sh\necho "npm must not run in this test (node_modules is a link)" >&2\nexit 1\n');
  chmodSync(npm, 0o755);
  return scriptEnv({ ...extra, PATH: `${binDir}:${process.env.PATH ?? ''}` });
}

/** Where scripts/lib/cluster-location.mjs keeps the cluster of a checkout the postgres user cannot enter. */
export const fallbackBaseOf = (checkout: string) =>
  path.join('/var/tmp', `seamwright-${createHash('sha256').update(checkout).digest('hex').slice(0, 12)}`);

/** A TCP port nobody listens on right now. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

// A postmaster of ours: alive, and (where /proc tells) really a postgres process, not a reused pid.
function isPostmaster(pid: number): boolean {
  try {
    process.kill(pid, 0);
  } catch {
    return false;
  }
  const cmdline = `/proc/${pid}/cmdline`;
  return !existsSync(cmdline) || readFileSync(cmdline, 'utf8').includes('postgres');
}

/**
 * Stops the clone's cluster with its own `db:stop` (pg_ctl stop, as postgres when root); if a postmaster
 * is still there, stops it by the pid in its lock file (SIGINT: PostgreSQL's fast shutdown).
 */
export async function stopCloneCluster(clone: string, env: NodeJS.ProcessEnv): Promise<void> {
  if (existsSync(path.join(clone, 'scripts/db.mjs')))
    spawnSync(process.execPath, ['scripts/db.mjs', 'stop'], { cwd: clone, env, stdio: 'ignore', timeout: 30_000 });
  for (const base of [path.join(clone, '.data'), fallbackBaseOf(clone)]) {
    const lock = path.join(base, 'pg', 'postmaster.pid');
    if (!existsSync(lock)) continue;
    const pid = Number(readFileSync(lock, 'utf8').split('\n')[0]);
    if (!(pid > 0) || !isPostmaster(pid)) continue;
    process.kill(pid, 'SIGINT');
    for (let i = 0; i < 100 && isPostmaster(pid); i++) await new Promise((r) => setTimeout(r, 100));
  }
}

/** Removes the clone's fallback cluster folder, if a run made one. */
export function removeFallbackBase(clone: string): void {
  rmSync(fallbackBaseOf(clone), { recursive: true, force: true });
}
