import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, mkdtempSync, realpathSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cloneEnv, fallbackBaseOf, freePort, makeClone, removeFallbackBase, stopCloneCluster } from './private-clone';

// `npm start` from a clone in a folder only its owner may enter (mktemp -d, /root): as root the cluster
// runs as the postgres system user, which cannot reach such a checkout, so it must move to a folder of
// its own under /var/tmp. The clone gets its own ports, so it never meets the suite's cluster.
const isRoot = process.getuid?.() === 0;
const idOf = (flag: '-u' | '-g', user: string) => Number(spawnSync('id', [flag, user], { encoding: 'utf8' }).stdout);

const privateDir = realpathSync(mkdtempSync(path.join(os.tmpdir(), 'sw-private-')));
const binDir = path.join(privateDir, 'bin');
const clones: { dir: string; env: NodeJS.ProcessEnv }[] = [];
let server: ChildProcess | undefined;

async function cloneWithPorts(name: string) {
  const dir = path.join(privateDir, name);
  makeClone(dir);
  const ports = { SEAMWRIGHT_DB_PORT: String(await freePort()), PORT: String(await freePort()) };
  const env = cloneEnv(binDir, { ...ports, HOST: '127.0.0.1', LOG_LEVEL: 'warn' });
  clones.push({ dir, env });
  return { dir, env, port: ports.PORT };
}

/** Polls GET /api/health until it answers, the start script exits, or `ms` pass. */
async function waitForHealth(child: ChildProcess, port: string, output: () => string, ms: number) {
  const deadline = Date.now() + ms;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`npm start exited with ${child.exitCode}:\n${output()}`);
    try {
      const res = await fetch(`http://127.0.0.1:${port}/api/health`, { signal: AbortSignal.timeout(2_000) });
      return { status: res.status, body: await res.json() };
    } catch {
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
  }
  throw new Error(`no answer from /api/health within ${ms} ms:\n${output()}`);
}

const exited = (child: ChildProcess) =>
  new Promise<number | null>((resolve) =>
    child.exitCode !== null ? resolve(child.exitCode) : child.once('exit', (code) => resolve(code)),
  );

function expectOwnedByPostgres(dir: string) {
  const stat = statSync(dir);
  expect({ dir, uid: stat.uid, mode: stat.mode & 0o777 }).toEqual({ dir, uid: idOf('-u', 'postgres'), mode: 0o700 });
}

describe('npm start from a clone in a 0700 folder', () => {
  beforeAll(() => {
    expect(statSync(privateDir).mode & 0o777).toBe(0o700);
  });

  afterAll(async () => {
    // The start script's whole process group (it, the server), in case a test stopped half-way.
    if (server?.pid && server.exitCode === null) {
      process.kill(-server.pid, 'SIGKILL');
      await exited(server);
    }
    for (const { dir, env } of clones) {
      await stopCloneCluster(dir, env);
      removeFallbackBase(dir);
    }
    rmSync(privateDir, { recursive: true, force: true });
  }, 90_000);

  it('initialises, migrates, seeds, builds and serves: /api/health answers ok, Ctrl-C stops it', async () => {
    const { dir, env, port } = await cloneWithPorts('seamwright');
    let output = '';
    server = spawn(process.execPath, ['scripts/start.mjs'], { cwd: dir, env, detached: true });
    server.stdout?.on('data', (chunk) => (output += chunk));
    server.stderr?.on('data', (chunk) => (output += chunk));

    const health = await waitForHealth(server, port, () => output, 100_000);
    expect(health, output).toEqual({ status: 200, body: { status: 'ok', db: 'ok' } });
    if (isRoot) {
      const base = fallbackBaseOf(dir);
      expect(output).toContain(`the database lives in ${base}`);
      expect(output).not.toContain('an older version left it'); // a fresh folder is no repair
      expectOwnedByPostgres(base);
      expectOwnedByPostgres(path.join(base, 'pg'));
      expect(existsSync(path.join(dir, '.data', 'pg'))).toBe(false);
    } else {
      expect(existsSync(path.join(dir, '.data', 'pg', 'PG_VERSION'))).toBe(true);
    }

    process.kill(server.pid!, 'SIGINT');
    expect(await exited(server)).toBe(0);
  }, 150_000);

  it.skipIf(!isRoot)(
    'hands a fallback folder an older version left root-owned over to postgres, and refuses a stranger’s',
    async () => {
      const { dir, env } = await cloneWithPorts('seamwright-stale');
      const base = fallbackBaseOf(dir);
      const dbStart = () =>
        spawnSync(process.execPath, ['scripts/db.mjs', 'start'], { cwd: dir, env, encoding: 'utf8', timeout: 60_000 });
      // What the old version left: the folder and its pg/ made by root, mode 0700, initdb refused.
      mkdirSync(path.join(base, 'pg'), { recursive: true, mode: 0o700 });

      const nobody = idOf('-u', 'nobody');
      if (nobody > 0) {
        chownSync(base, nobody, idOf('-g', 'nobody'));
        const refused = dbStart();
        expect(refused.status, refused.stderr).toBe(1);
        expect(refused.stderr).toContain(`${base} belongs to another user`);
        expect(statSync(base).uid).toBe(nobody);
        chownSync(base, 0, 0);
      }

      const started = dbStart();
      expect(started.status, started.stderr).toBe(0);
      expect(started.stderr).toContain(`handing ${base} over to the postgres user`);
      expectOwnedByPostgres(base);
      expect(existsSync(path.join(base, 'pg', 'PG_VERSION'))).toBe(true);
    },
    60_000,
  );
});
