// Runs PostgreSQL's programs, as the `postgres` system user when we are root (initdb and postgres refuse root).
import { spawnSync } from 'node:child_process';
import { fail } from './log.mjs';

export const isRoot = process.getuid?.() === 0;

// Every program starts in "/": the caller's folder may be a checkout the postgres user cannot enter, and
// initdb and pg_ctl stop with "could not change directory … Permission denied" when they start there.
// Paths handed to these programs are therefore always absolute.
const reachableCwd = '/';

/**
 * Runs `cmd` with `args` and waits for it.
 * @param options.asPostgres - as root, run it as the `postgres` user (as anyone else, run it as yourself)
 * @param options.quiet - capture stdout and stderr (default) instead of passing them through
 */
export function run(cmd, args, { asPostgres = false, quiet = true } = {}) {
  const [file, argv] = asPostgres && isRoot ? ['runuser', ['-u', 'postgres', '--', cmd, ...args]] : [cmd, args];
  return spawnSync(file, argv, { cwd: reachableCwd, encoding: 'utf8', stdio: quiet ? 'pipe' : 'inherit' });
}

/** The uid and gid of the `postgres` system user (root only needs them, to hand folders over). */
export function postgresIds() {
  const u = run('id', ['-u', 'postgres']);
  const g = run('id', ['-g', 'postgres']);
  if (u.status !== 0 || g.status !== 0)
    fail('running as root needs the "postgres" system user (it comes with the postgresql package).');
  return { uid: Number(u.stdout), gid: Number(g.stdout) };
}
