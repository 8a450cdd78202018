// The real server as its own operating-system process (`node --import tsx server/index.ts`), for the tests
// that need what one process cannot show: several servers on one database, signals, `kill -9`.
import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import net from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** The checkout's root folder (this file is tests/helpers/server-process.ts). */
export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

// tsx compiles the server on start; on a busy machine (test files run side by side) that takes seconds.
const START_TIMEOUT_MS = 30_000;
// How many times a start is retried when the free port found was taken before the server could listen.
const PORT_ATTEMPTS = 3;

/** How a server process ended: its exit code, or the signal that killed it. */
export interface ProcessExit {
  code: number | null;
  signal: NodeJS.Signals | null;
}

export interface ServerProcess {
  /** `http://127.0.0.1:<port>`, also the server's APP_URL (the Origin its writes must carry). */
  baseUrl: string;
  pid: number;
  child: ChildProcess;
  /** Resolves once the process has exited, however that happened. */
  exited: Promise<ProcessExit>;
  /** Sends `signal` (default SIGTERM) unless it has already exited; resolves with how it ended. */
  stop(signal?: NodeJS.Signals): Promise<ProcessExit>;
  /** Everything the process wrote to stdout and stderr so far (pino's JSON lines go to stdout). */
  output(): string;
}

const running = new Set<ChildProcess>();

// A test process that dies without its afterAll must not leave servers behind on the shared cluster.
process.once('exit', () => {
  for (const child of running) child.kill('SIGKILL');
});

/** A port of 127.0.0.1 that was free a moment ago (found by listening on port 0 and closing). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

/** A rate-limit scope (RATE_LIMIT_SCOPE) used by nothing else: servers given the same one share their counts. */
export function uniqueRateLimitScope(): string {
  return `proc-${randomUUID().slice(0, 8)}`;
}

/**
 * Starts the server in a child process on a free port of 127.0.0.1, on the test database (DATABASE_URL),
 * with the local mail catcher on, warnings and worse logged, and a rate-limit scope of its own unless
 * `env` names one. Resolves once the server reports `{type: 'listening'}` over IPC.
 *
 * @param env - variables to set or override (e.g. RATE_LIMIT_SIGN_IN, LOG_LEVEL, RATE_LIMIT_SCOPE)
 * @throws when the process exits or stays silent for 30 s before listening; the message has its output
 */
export async function startServerProcess(env: Record<string, string> = {}): Promise<ServerProcess> {
  if (!process.env.DATABASE_URL) throw new Error('Server process tests need DATABASE_URL: run them with `npm test`.');
  for (let attempt = 1; ; attempt++) {
    try {
      return await startOnce(await freePort(), env);
    } catch (error) {
      // Another program took the port between the probe and the server's listen: try another one.
      const taken = error instanceof Error && error.message.includes('already in use');
      if (!taken || attempt >= PORT_ATTEMPTS) throw error;
    }
  }
}

function startOnce(port: number, overrides: Record<string, string>): Promise<ServerProcess> {
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: repoRoot,
    stdio: ['ignore', 'pipe', 'pipe', 'ipc'],
    env: {
      ...process.env,
      NODE_ENV: 'test',
      DATABASE_URL: process.env.DATABASE_URL,
      PORT: String(port),
      HOST: '127.0.0.1',
      APP_URL: baseUrl,
      MAIL_CATCHER: 'on',
      LOG_LEVEL: 'warn',
      RATE_LIMIT_SCOPE: uniqueRateLimitScope(),
      ...overrides,
    },
  });
  running.add(child);
  let log = '';
  child.stdout?.setEncoding('utf8').on('data', (chunk: string) => (log += chunk));
  child.stderr?.setEncoding('utf8').on('data', (chunk: string) => (log += chunk));
  const exited = new Promise<ProcessExit>((resolve) => {
    child.once('exit', (code, signal) => {
      running.delete(child);
      resolve({ code, signal });
    });
  });
  const server: ServerProcess = {
    baseUrl,
    pid: child.pid!,
    child,
    exited,
    output: () => log,
    async stop(signal = 'SIGTERM') {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      return exited;
    },
  };
  return new Promise((resolve, reject) => {
    let settled = false;
    const fail = (why: string) => {
      if (settled) return;
      settled = true;
      clearTimeout(timer);
      child.kill('SIGKILL');
      reject(new Error(`the server process ${why}; its output:\n${log}`));
    };
    const timer = setTimeout(
      () => fail(`did not report listening within ${START_TIMEOUT_MS / 1000} s`),
      START_TIMEOUT_MS,
    );
    child.on('message', (message: { type?: string }) => {
      if (message?.type !== 'listening' || settled) return;
      settled = true;
      clearTimeout(timer);
      resolve(server);
    });
    void exited.then(({ code, signal }) => fail(`exited before listening (code ${code}, signal ${signal})`));
  });
}

/** Kills (SIGKILL) every server process this test file started that is still running; for afterAll. */
export async function killLeftoverServers(): Promise<void> {
  const left = [...running];
  await Promise.all(
    left.map(
      (child) =>
        new Promise<void>((resolve) => {
          if (child.exitCode !== null || child.signalCode !== null) return resolve();
          child.once('exit', () => resolve());
          child.kill('SIGKILL');
        }),
    ),
  );
}

/** The `seamwright_session=<id>` pair from a reply's Set-Cookie headers, to send as a Cookie header. */
export function sessionCookieOf(res: Response): string {
  const pair = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0] ?? '')
    .find((c) => c.startsWith('seamwright_session=') && c !== 'seamwright_session=');
  if (!pair) throw new Error(`no session cookie in the reply (status ${res.status})`);
  return pair;
}

/**
 * Sends a JSON request to one server process. Writes carry `Origin: <baseUrl>` (the server's APP_URL), as a
 * browser on the app's page would send, so they pass the same-origin check.
 */
export function call(
  server: Pick<ServerProcess, 'baseUrl'>,
  method: string,
  route: string,
  { body, cookie }: { body?: unknown; cookie?: string } = {},
): Promise<Response> {
  const headers: Record<string, string> = {};
  if (body !== undefined) headers['content-type'] = 'application/json';
  if (method !== 'GET' && method !== 'HEAD') headers.origin = server.baseUrl;
  if (cookie) headers.cookie = cookie;
  return fetch(`${server.baseUrl}${route}`, {
    method,
    headers,
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

/** A long random password: never on the common-password list. */
export function randomPassword(): string {
  return `proc-${randomUUID()}`;
}

/**
 * Signs up a new account on `server` (a random e-mail on the invented studio's domain) and returns its
 * session cookie, user id and personal team id.
 */
export async function signUpOn(server: Pick<ServerProcess, 'baseUrl'>, who = 'proc') {
  const email = `${who}-${randomUUID().slice(0, 8)}@quillmoss.example`;
  const password = randomPassword();
  const res = await call(server, 'POST', '/api/auth/sign-up', { body: { email, password, name: 'Process Person' } });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const me = (await res.json()) as { user: { id: string }; teams: { id: string }[] };
  return { email, password, cookie: sessionCookieOf(res), userId: me.user.id, personalTeamId: me.teams[0]!.id };
}
