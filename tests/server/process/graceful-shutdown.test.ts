// SIGTERM (what a process manager or `docker stop` sends) while kits are being built: the server stops
// taking connections at once, answers the requests it already has in full, then closes its job queue,
// geometry threads, mail catcher and database pool and exits 0.
import http from 'node:http';
import net from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import JSZip from 'jszip';
import { call, killLeftoverServers, startServerProcess, type ServerProcess } from '../../helpers/server-process';

// 64 round keys of 20 mm with a fine chord tolerance: about 165,000 triangles, 8 MB of STL (the budget is 50 MB),
// a few hundred ms of building on a geometry thread.
const heavyKit = {
  joint: 'key',
  material: 'PLA',
  fit: 'snug',
  chordTolerance: 0.002,
  face: { shape: 'rect', width: 400, height: 400 },
  key: { shape: 'round', width: 20, depth: 10, count: 64 },
};
const IN_FLIGHT = 4;
const EXIT_WITHIN_MS = 15_000;

/** Resolves with the error code of a fresh TCP connection to `port`, or 'connected' if one was accepted. */
function connectOutcome(port: number): Promise<string> {
  return new Promise((resolve) => {
    const socket = net.connect(port, '127.0.0.1');
    socket.once('connect', () => {
      socket.destroy();
      resolve('connected');
    });
    socket.once('error', (error: NodeJS.ErrnoException) => resolve(error.code ?? error.message));
  });
}

async function waitForLog(server: ServerProcess, text: string, ms: number): Promise<void> {
  const end = Date.now() + ms;
  while (!server.output().includes(text)) {
    if (Date.now() > end) throw new Error(`no "${text}" in the server's log:\n${server.output()}`);
    await new Promise((r) => setTimeout(r, 5));
  }
}

async function expectFullKitZip(res: Response) {
  expect(res.status).toBe(200);
  expect(res.headers.get('content-type')).toMatch(/application\/zip/);
  const bytes = Buffer.from(await res.arrayBuffer());
  expect(Number(res.headers.get('content-length'))).toBe(bytes.length);
  // A cut-off zip has no central directory and does not open.
  const zip = await JSZip.loadAsync(bytes);
  const names = Object.keys(zip.files);
  expect(names).toEqual(expect.arrayContaining(['manifest.json', 'README.txt']));
  const manifest = JSON.parse(await zip.file('manifest.json')!.async('string')) as { parts: { file: string }[] };
  for (const part of manifest.parts) {
    const stl = await zip.file(part.file)!.async('uint8array');
    // Binary STL: 80-byte header, triangle count, 50 bytes per triangle.
    expect(stl.length).toBe(84 + 50 * new DataView(stl.buffer, stl.byteOffset).getUint32(80, true));
  }
  return bytes.length;
}

/** One request over `agent` (node:http, so the test chooses how connections are kept); resolves when read. */
function viaAgent(agent: http.Agent, server: ServerProcess, method: string, route: string, body?: unknown) {
  return new Promise<{ status: number; connection: string | undefined; bytes: number }>((resolve, reject) => {
    const url = new URL(route, server.baseUrl);
    const req = http.request(
      url,
      { method, agent, headers: { 'content-type': 'application/json', origin: server.baseUrl } },
      (res) => {
        let bytes = 0;
        res.on('data', (chunk: Buffer) => (bytes += chunk.length));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, connection: res.headers.connection, bytes }));
      },
    );
    req.on('error', reject);
    req.end(body === undefined ? undefined : JSON.stringify(body));
  });
}

describe('the server process on SIGTERM', () => {
  let server: ServerProcess;

  beforeAll(async () => {
    server = await startServerProcess({ LOG_LEVEL: 'info' });
  });
  afterAll(async () => {
    await killLeftoverServers();
  });

  it('finishes the requests in flight, refuses new connections, closes the pool and exits 0', async () => {
    const port = Number(new URL(server.baseUrl).port);
    // One kit first, for its time and so the geometry threads are warm.
    const warmStart = performance.now();
    const warmBytes = await expectFullKitZip(await call(server, 'POST', '/api/kits', { body: heavyKit }));
    const oneKitMs = performance.now() - warmStart;

    const started = performance.now();
    const answered: number[] = [];
    const inFlight = Array.from({ length: IN_FLIGHT }, () =>
      call(server, 'POST', '/api/kits', { body: heavyKit }).then((res) => {
        answered.push(performance.now());
        return res;
      }),
    );
    // Long enough for the server to have read every request, well before the first can be answered.
    await new Promise((r) => setTimeout(r, Math.min(150, oneKitMs / 3)));
    expect(answered).toHaveLength(0);
    const signalledAt = performance.now();
    expect(server.child.kill('SIGTERM')).toBe(true);
    await waitForLog(server, 'shutting down', 5_000);

    // The listener is closed: a new connection is refused, while the kits in flight go on being built.
    expect(await connectOutcome(port)).toBe('ECONNREFUSED');

    const replies = await Promise.all(inFlight);
    for (const res of replies) expect(await expectFullKitZip(res)).toBe(warmBytes);
    expect(Math.min(...answered)).toBeGreaterThan(signalledAt);

    const exit = await Promise.race([
      server.exited,
      new Promise<'timeout'>((r) => setTimeout(() => r('timeout'), EXIT_WITHIN_MS)),
    ]);
    const exitMs = performance.now() - signalledAt;
    expect(exit, server.output()).toEqual({ code: 0, signal: null });
    // "stopped" is logged after the pool has ended, just before the exit.
    const messages = server
      .output()
      .split('\n')
      .filter((line) => line.startsWith('{'))
      .map((line) => (JSON.parse(line) as { msg?: string }).msg);
    expect(messages).toContain('shutting down: no new requests, finishing those in flight');
    expect(messages.at(-1)).toBe('stopped');
    expect(server.output()).not.toMatch(/did not stop cleanly/);
    console.info(
      `one kit ${oneKitMs.toFixed(0)} ms (${warmBytes} bytes); ${IN_FLIGHT} in flight answered ` +
        `${(Math.max(...answered) - started).toFixed(0)} ms after they were sent; exit ${exitMs.toFixed(0)} ms after SIGTERM`,
    );
  });

  // KNOWN BUG (server/index.ts, shutdown): server.close() only closes the connections idle at that moment. A
  // connection whose request was in flight stays open after its reply (still "Connection: keep-alive"), so the
  // client can go on sending requests on it, and they are answered, until the keep-alive timeout or the 10 s
  // grace cuts it (then possibly mid-request). `it.fails` keeps the suite green while the bug is there and
  // turns red once it is fixed: then make this a plain `it`.
  it.fails('takes no new request on a kept-alive connection after SIGTERM', async () => {
    const doomed = await startServerProcess({ LOG_LEVEL: 'info' });
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
    try {
      const inFlight = viaAgent(agent, doomed, 'POST', '/api/kits', heavyKit);
      await new Promise((r) => setTimeout(r, 150));
      doomed.child.kill('SIGTERM');
      await waitForLog(doomed, 'shutting down', 5_000);
      const reply = await inFlight;
      expect(reply.status).toBe(200);
      // The reply to a request in flight at SIGTERM should close its connection ...
      expect(reply.connection).toBe('close');
      // ... so the next request over the same agent needs a new connection, which is refused.
      await expect(viaAgent(agent, doomed, 'GET', '/api/health')).rejects.toMatchObject({ code: 'ECONNREFUSED' });
    } finally {
      agent.destroy();
      await doomed.stop('SIGKILL');
    }
  });
});
