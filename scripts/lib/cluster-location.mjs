// Where the cluster's files live, and making those folders usable by the user the cluster runs as.
// Normally that is .data/ in the checkout. As root the cluster runs as the `postgres` system user; when
// that user cannot enter the checkout (a clone inside /root or another 0700 folder), the cluster lives in
// /var/tmp/seamwright-<hash of the checkout path> instead, a folder owned by postgres with mode 0700.
import { chmodSync, chownSync, lstatSync, mkdirSync } from 'node:fs';
import { createHash } from 'node:crypto';
import path from 'node:path';
import { dataDir, root } from './paths.mjs';
import { isRoot, postgresIds, run } from './pg-run.mjs';
import { fail, say } from './log.mjs';

/** The folder that holds the cluster when the postgres user cannot reach `checkout`: one per checkout path. */
export function fallbackBase(checkout = root) {
  const tag = createHash('sha256').update(checkout).digest('hex').slice(0, 12);
  return path.join('/var/tmp', `seamwright-${tag}`);
}

const postgresCanEnter = (dir) => run('sh', ['-c', 'cd "$1"', 'sh', dir], { asPostgres: true }).status === 0;

function resolveLocation() {
  let base = dataDir;
  if (isRoot) {
    mkdirSync(dataDir, { recursive: true });
    if (!postgresCanEnter(dataDir)) {
      base = fallbackBase();
      say(`the postgres system user cannot enter ${dataDir} (the checkout is in a private folder),`);
      say(`so the database lives in ${base}; to remove it: npm run db:stop, then rm -rf ${base}`);
    }
  }
  return {
    base,
    fallback: base !== dataDir,
    clusterDir: path.join(base, 'pg'),
    socketDir: path.join(base, 'pg-run'),
    logFile: path.join(base, 'pg-run', 'postgres.log'),
  };
}

export const location = resolveLocation();

function plainFolder(dir) {
  const stat = lstatSync(dir);
  if (!stat.isDirectory()) fail(`${dir} is not a folder (a link or a file?); remove it and run the command again.`);
  return stat;
}

// /var/tmp is writable by everyone: accept only a plain folder owned by postgres, or by root (an older
// Seamwright made it root's and private, so initdb could not enter it: that one is repaired, not refused).
function prepareFallbackBase() {
  const { uid, gid } = postgresIds();
  let made = true;
  try {
    mkdirSync(location.base, { mode: 0o700 });
  } catch (error) {
    if (error.code !== 'EEXIST') throw error;
    made = false;
  }
  const stat = plainFolder(location.base);
  if (stat.uid !== uid && stat.uid !== 0)
    fail(`${location.base} belongs to another user (uid ${stat.uid}); remove it and run the command again.`);
  if (stat.uid === uid && (stat.mode & 0o777) === 0o700) return;
  const why = stat.uid === uid ? 'it was not private' : "an older version left it root's";
  if (!made) say(`handing ${location.base} over to the postgres user, mode 0700 (${why})`);
  chownSync(location.base, uid, gid);
  chmodSync(location.base, 0o700);
}

/** Creates one of the cluster's folders (mode 0700); as root, hands it and a fallback base to postgres. */
export function prepareFolder(dir) {
  if (location.fallback) prepareFallbackBase();
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  if (!isRoot) return;
  plainFolder(dir);
  const { uid, gid } = postgresIds();
  chownSync(dir, uid, gid);
}
