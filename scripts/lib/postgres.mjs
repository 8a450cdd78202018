// Finds, installs, initialises, starts and stops the project's own PostgreSQL cluster.
// It listens on 127.0.0.1 only, at a non-default port, with its unix socket inside the data folder.
// Where its files live (and who owns them) is cluster-location.mjs; how its programs run is pg-run.mjs.
import { existsSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import path from 'node:path';

import { dbPort } from './db-settings.mjs';
import { location, prepareFolder } from './cluster-location.mjs';
import { isRoot, run } from './pg-run.mjs';
import { fail, say } from './log.mjs';

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

/** Runs one SQL string (several statements run as one transaction) in `database`; returns the result. */
export function psql(bin, database, sql) {
  return run(path.join(bin, 'psql'), [
    '-h',
    '127.0.0.1',
    '-p',
    String(dbPort),
    '-U',
    'postgres',
    '-d',
    database,
    '-v',
    'ON_ERROR_STOP=1',
    '-tAc',
    sql,
  ]);
}

/** Whether the cluster has a database of this name. */
export function databaseExists(bin, name) {
  const r = psql(bin, 'postgres', `SELECT 1 FROM pg_database WHERE datname = '${name}'`);
  if (r.status !== 0) fail(`could not list the databases:\n${r.stderr}`);
  return r.stdout.trim() === '1';
}

/** Creates the database when it does not exist yet; with `fresh`, drops it first. */
export function ensureDatabase(bin, name, { fresh = false } = {}) {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) fail(`bad database name ${name}`);
  if (fresh) psql(bin, 'postgres', `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
  if (databaseExists(bin, name)) return;
  const r = psql(bin, 'postgres', `CREATE DATABASE ${name}`);
  if (r.status !== 0) fail(`could not create database ${name}:\n${r.stderr}`);
}
