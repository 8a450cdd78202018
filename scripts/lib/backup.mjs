// `npm run db:backup -- FILE` and `npm run db:restore -- FILE --yes`: pg_dump's custom format, and a restore
// that cannot lose the current data: it fills a fresh database first and swaps it in only when that worked.
import { existsSync, renameSync, rmSync, statSync } from 'node:fs';
import path from 'node:path';
import { dbPort } from './db-settings.mjs';
import { databaseExists, ensureServerBinaries, psql, startCluster } from './postgres.mjs';
import { run } from './pg-run.mjs';
import { fail, say } from './log.mjs';

const connection = () => ['-h', '127.0.0.1', '-p', String(dbPort), '-U', 'postgres'];
// pg_restore's first line without its "pg_restore: error: " prefix.
const firstLine = (text) => (text.trim().split('\n')[0] ?? '').replace(/^pg_restore: (error: )?/, '');
const sizeText = (bytes) => (bytes < 1e6 ? `${Math.ceil(bytes / 1e3)} kB` : `${(bytes / 1e6).toFixed(1)} MB`);

/** Refuses names our SQL cannot take as they are, the cluster's own databases, and names too long for
 *  the temporary `<name>_restoring` / `<name>_replaced` beside them (PostgreSQL cuts names at 63 bytes). */
function checkDatabaseName(name) {
  if (!/^[a-z_][a-z0-9_]{0,49}$/.test(name))
    fail(`bad database name "${name}": use up to 50 lower-case letters, digits and _, not starting with a digit.`);
  if (['postgres', 'template0', 'template1'].includes(name)) fail(`"${name}" is the cluster's own database.`);
}

/** Writes `database` to `file` with pg_dump -Fc; an existing file is replaced only by a complete dump. */
export async function backupDatabase(file, database) {
  checkDatabaseName(database);
  const folder = path.dirname(file);
  if (!existsSync(folder) || !statSync(folder).isDirectory()) fail(`cannot write ${file}: no folder ${folder}.`);
  if (existsSync(file) && !statSync(file).isFile()) fail(`cannot write ${file}: it is not a file.`);
  const bin = ensureServerBinaries();
  await startCluster(bin);
  if (!databaseExists(bin, database)) fail(`there is no database "${database}" to back up.`);
  const partial = path.join(folder, `.${path.basename(file)}.partial-${process.pid}`);
  // The dump holds password hashes and sessions: only its owner may read it.
  const umask = process.umask(0o077);
  const r = run(path.join(bin, 'pg_dump'), ['-Fc', ...connection(), '-d', database, '-f', partial]);
  process.umask(umask);
  if (r.status !== 0) {
    rmSync(partial, { force: true });
    fail(`pg_dump failed, ${file} was not written:\n${r.stderr}`);
  }
  renameSync(partial, file);
  say(`backed up the "${database}" database to ${file} (${sizeText(statSync(file).size)})`);
}

// pg_restore reads an archive's table of contents without a database: a missing, empty, plain-SQL or
// foreign file is refused here, before the question and before anything is touched.
function checkArchive(bin, file) {
  if (!existsSync(file)) fail(`${file} does not exist; nothing was changed.`);
  if (!statSync(file).isFile()) fail(`${file} is not a file; nothing was changed.`);
  const r = run(path.join(bin, 'pg_restore'), ['--list', file]);
  if (r.status !== 0) fail(`${file} is not a backup made by db:backup (${firstLine(r.stderr)}); nothing was changed.`);
}

function dropDatabase(bin, name) {
  return psql(bin, 'postgres', `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`).status === 0;
}

// Only names change here, inside one transaction: either the restored copy is `database` afterwards, or
// nothing changed. Connections are refused during the swap and the open ones (a running server) are
// closed; a server's pool then reconnects to the restored database under the same name.
function swapIn(bin, fresh, database, replaced) {
  if (!databaseExists(bin, database)) {
    if (psql(bin, 'postgres', `ALTER DATABASE ${fresh} RENAME TO ${database}`).status === 0) return;
    dropDatabase(bin, fresh);
    fail(`could not name the restored database "${database}".`);
  }
  psql(bin, 'postgres', `ALTER DATABASE ${database} WITH ALLOW_CONNECTIONS false`);
  const swap = psql(
    bin,
    'postgres',
    `SELECT count(pg_terminate_backend(pid)) FROM pg_stat_activity WHERE datname = '${database}';
     ALTER DATABASE ${database} RENAME TO ${replaced};
     ALTER DATABASE ${fresh} RENAME TO ${database}`,
  );
  if (swap.status !== 0) {
    psql(bin, 'postgres', `ALTER DATABASE ${database} WITH ALLOW_CONNECTIONS true`);
    dropDatabase(bin, fresh);
    fail(`could not swap the restored copy in, so "${database}" was left as it was:\n${swap.stderr}`);
  }
  if (!dropDatabase(bin, replaced)) say(`the data as it was before is still in the database "${replaced}".`);
}

/**
 * Restores `file` (a db:backup) as `database`: pg_restore into `<database>_restoring`, created empty from
 * template0, in one transaction; only when that succeeded does it replace `database` (or become it).
 * @param confirm - awaited after the file was checked and before anything changes; it exits to refuse
 */
export async function restoreDatabase(file, database, { confirm }) {
  checkDatabaseName(database);
  const bin = ensureServerBinaries();
  checkArchive(bin, file);
  await confirm();
  await startCluster(bin);
  const fresh = `${database}_restoring`;
  const replaced = `${database}_replaced`;
  // Left over from a restore that was killed half-way: the first is incomplete, the second was to go.
  for (const leftover of [fresh, replaced]) {
    if (!databaseExists(bin, leftover)) continue;
    say(`dropping "${leftover}", left over from an earlier restore that did not finish`);
    if (!dropDatabase(bin, leftover)) fail(`could not drop "${leftover}"; nothing was changed.`);
  }
  const created = psql(bin, 'postgres', `CREATE DATABASE ${fresh} TEMPLATE template0`);
  if (created.status !== 0) fail(`could not create "${fresh}"; nothing was changed:\n${created.stderr}`);
  say(`restoring ${file} into a fresh database…`);
  const args = ['--exit-on-error', '--single-transaction', '--no-owner', ...connection(), '-d', fresh, file];
  const r = run(path.join(bin, 'pg_restore'), args);
  if (r.status !== 0) {
    dropDatabase(bin, fresh);
    fail(`the restore failed, so "${database}" was left as it was:\n${r.stderr}`);
  }
  swapIn(bin, fresh, database, replaced);
  say(`restored the "${database}" database from ${file}`);
}
