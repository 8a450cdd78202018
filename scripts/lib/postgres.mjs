// Finds, installs, initialises, starts and stops the project's own PostgreSQL cluster.
// It listens on 127.0.0.1 only, at a non-default port, with its unix socket inside the data folder.
import { existsSync, mkdirSync, readFileSync, readdirSync, rmSync, chownSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { spawnSync } from 'node:child_process';
import path from 'node:path';

import { root, dataDir } from './paths.mjs';
import { dbPort } from './db-settings.mjs';
import { fail, say } from './log.mjs';

const isRoot = process.getuid?.() === 0;

function run(cmd, args, { asPostgres = false, quiet = true } = {}) {
  const [file, argv] = asPostgres && isRoot ? ['runuser', ['-u', 'postgres', '--', cmd, ...args]] : [cmd, args];
  return spawnSync(file, argv, { encoding: 'utf8', stdio: quiet ? 'pipe' : 'inherit' });
}

function findBinDir() {
  const debianRoot = '/usr/lib/postgresql';
  if (existsSync(debianRoot)) {
    const versions = readdirSync(debianRoot)
      .filter((v) => existsSync(path.join(debianRoot, v, 'bin', 'initdb')))
      .sort((a, b) => Number(b) - Number(a));
    if (versions[0]) return path.join(debianRoot, versions[0], 'bin');
  }
  const which = spawnSync('sh', ['-c', 'command -v initdb'], { encoding: 'utf8' });
  return which.status === 0 ? path.dirname(which.stdout.trim()) : null;
}

function installServer() {
  if (!isRoot || !existsSync('/usr/bin/apt-get')) {
    fail(
      'PostgreSQL server binaries (initdb, pg_ctl) were not found. Install PostgreSQL 15 or newer ' +
        '(on Debian: sudo apt-get install postgresql) and run the command again.',
    );
  }
  say('installing PostgreSQL from Debian packages (apt-get)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', '--no-install-recommends', 'postgresql']]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) fail(`apt-get ${args.join(' ')} failed; install the postgresql package by hand.`);
  }
}

/** The PostgreSQL bin folder, installing the server package when it is missing. */
export function ensureServerBinaries() {
  let bin = findBinDir();
  if (!bin) {
    installServer();
    bin = findBinDir();
  }
  if (!bin) fail('PostgreSQL was installed but initdb is still not found.');
  return bin;
}

// As root, the cluster runs as the `postgres` system user, which must be able to reach the folder.
// When the checkout sits somewhere it cannot enter (a private home folder), use a folder under /var/tmp.
function resolveLocation() {
  let base = dataDir;
  if (isRoot) {
    mkdirSync(dataDir, { recursive: true });
    const reach = run('sh', ['-c', 'cd "$1"', 'sh', dataDir], { asPostgres: true });
    if (reach.status !== 0) {
      const tag = createHash('sha256').update(root).digest('hex').slice(0, 12);
      base = path.join('/var/tmp', `seamwright-${tag}`);
      say(`the postgres user cannot enter ${dataDir}; keeping the cluster in ${base}`);
    }
  }
  return {
    clusterDir: path.join(base, 'pg'),
    socketDir: path.join(base, 'pg-run'),
    logFile: path.join(base, 'pg-run', 'postgres.log'),
  };
}

export const location = resolveLocation();

function prepareFolder(dir) {
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  if (isRoot) {
    const { uid, gid } = postgresIds();
    chownSync(dir, uid, gid);
  }
}

function postgresIds() {
  const r = spawnSync('id', ['-u', 'postgres'], { encoding: 'utf8' });
  const g = spawnSync('id', ['-g', 'postgres'], { encoding: 'utf8' });
  if (r.status !== 0) fail('running as root needs the "postgres" system user (it comes with the postgresql package).');
  return { uid: Number(r.stdout), gid: Number(g.stdout) };
}

export function isReady(bin) {
  return run(path.join(bin, 'pg_isready'), ['-h', '127.0.0.1', '-p', String(dbPort), '-q']).status === 0;
}

function pidFromLock() {
  const lock = path.join(location.clusterDir, 'postmaster.pid');
  if (!existsSync(lock)) return null;
  const [pid, , , port] = readFileSync(lock, 'utf8').split('\n');
  return { lock, pid: Number(pid), port: Number(port) };
}

function isAlive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

// A postmaster killed with -9 leaves its lock file; its process may linger for a few seconds.
async function clearStaleLock() {
  const held = pidFromLock();
  if (!held) return;
  for (let i = 0; i < 50 && isAlive(held.pid); i++) await sleep(200);
  if (isAlive(held.pid))
    fail(`PostgreSQL (pid ${held.pid}) holds ${location.clusterDir} but does not answer; stop it and retry.`);
  say('removing a stale lock left by a PostgreSQL that did not shut down cleanly');
  rmSync(held.lock, { force: true });
}

function initCluster(bin) {
  say(`creating the database cluster in ${location.clusterDir}`);
  prepareFolder(location.clusterDir);
  const r = run(
    path.join(bin, 'initdb'),
    ['-D', location.clusterDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--no-locale'],
    { asPostgres: true },
  );
  if (r.status !== 0) fail(`initdb failed:\n${r.stderr}`);
}

/** Starts the cluster (creating it on first use); a running cluster of ours is reused. */
export async function startCluster(bin) {
  const ours = pidFromLock();
  if (isReady(bin)) {
    if (ours && ours.port === dbPort && isAlive(ours.pid)) return;
    fail(
      `port ${dbPort} is taken by another PostgreSQL or program. Pick another port: SEAMWRIGHT_DB_PORT=5545 npm start`,
    );
  }
  if (!existsSync(path.join(location.clusterDir, 'PG_VERSION'))) initCluster(bin);
  await clearStaleLock();
  prepareFolder(location.socketDir);
  const options = `-c listen_addresses=127.0.0.1 -p ${dbPort} -k ${location.socketDir}`;
  const r = run(
    path.join(bin, 'pg_ctl'),
    ['start', '-D', location.clusterDir, '-w', '-t', '60', '-l', location.logFile, '-o', options],
    { asPostgres: true },
  );
  if (r.status !== 0) {
    const tail = existsSync(location.logFile)
      ? readFileSync(location.logFile, 'utf8').split('\n').slice(-8).join('\n')
      : '';
    fail(`PostgreSQL did not start on 127.0.0.1:${dbPort}.\n${r.stderr}${tail}`);
  }
  say(`PostgreSQL is running on 127.0.0.1:${dbPort}`);
}

export function stopCluster(bin) {
  if (!existsSync(path.join(location.clusterDir, 'postmaster.pid'))) {
    say('PostgreSQL is not running.');
    return;
  }
  const r = run(path.join(bin, 'pg_ctl'), ['stop', '-D', location.clusterDir, '-m', 'fast', '-w'], {
    asPostgres: true,
  });
  if (r.status !== 0) fail(`pg_ctl stop failed:\n${r.stderr}`);
  say('PostgreSQL stopped.');
}

function psql(bin, database, sql) {
  return run(path.join(bin, 'psql'), [
    '-h',
    '127.0.0.1',
    '-p',
    String(dbPort),
    '-U',
    'postgres',
    '-d',
    database,
    '-tAc',
    sql,
  ]);
}

/** Creates the database when it does not exist yet; with `fresh`, drops it first. */
export function ensureDatabase(bin, name, { fresh = false } = {}) {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) fail(`bad database name ${name}`);
  if (fresh) psql(bin, 'postgres', `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
  const exists = psql(bin, 'postgres', `SELECT 1 FROM pg_database WHERE datname = '${name}'`);
  if (exists.stdout.trim() === '1') return;
  const r = psql(bin, 'postgres', `CREATE DATABASE ${name}`);
  if (r.status !== 0) fail(`could not create database ${name}:\n${r.stderr}`);
}
