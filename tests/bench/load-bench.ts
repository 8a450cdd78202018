// `npm run bench` (load part): 50 kit downloads at once against a real server process while /api/health is
// asked every 20 ms. Target: health answers within 50 ms under that load (the solids are built on worker
// threads, not on the event loop), zero errors. Prints p50/p99 of kits and of health, and the server's
// memory before and after. Reported, not asserted. Traffic goes to 127.0.0.1 only and stops by itself.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
import { referenceKits } from './reference-kits';

const CONCURRENT = 50;
const KITS = 400;
const HEALTH_EVERY_MS = 20;
const HEALTH_TARGET_MS = 50;

const url = process.env.DATABASE_URL;
if (!url) throw new Error('run the load benchmark with `npm run bench` (it sets DATABASE_URL)');
const root = path.resolve(import.meta.dirname, '..', '..');

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise((resolve) => server.close(resolve));
  return port;
}

const port = await freePort();
const base = `http://127.0.0.1:${port}`;
const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
  cwd: root,
  stdio: ['ignore', 'ignore', 'inherit', 'ipc'],
  env: { ...process.env, NODE_ENV: 'production', PORT: String(port), APP_URL: base, MAIL_CATCHER: 'on', LOG_LEVEL: 'warn' },
});
await new Promise<void>((resolve, reject) => {
  child.on('message', (m: { type?: string }) => m?.type === 'listening' && resolve());
  child.on('exit', (code) => reject(new Error(`the server exited with ${code} before listening`)));
});

/** Resident memory of the server process (its worker threads included), MB. */
const rssMb = () => Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'))![1]) / 1024;
const pct = (values: number[], p: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
};
const line = (values: number[]) =>
  `p50 ${pct(values, 50).toFixed(1)} ms, p99 ${pct(values, 99).toFixed(1)} ms, max ${Math.max(...values).toFixed(1)} ms (${values.length})`;

async function timed(input: string, init?: RequestInit): Promise<{ ms: number; ok: boolean; bytes: number }> {
  const start = performance.now();
  try {
    const res = await fetch(input, init);
    const bytes = (await res.arrayBuffer()).byteLength;
    return { ms: performance.now() - start, ok: res.ok, bytes };
  } catch {
    return { ms: performance.now() - start, ok: false, bytes: 0 };
  }
}

const kitInit = (i: number): RequestInit => ({
  method: 'POST',
  headers: { 'content-type': 'application/json', origin: base },
  body: JSON.stringify(referenceKits[i % referenceKits.length]!.request),
});

// Warm up: the first kit on each thread compiles the geometry code.
for (let i = 0; i < 6; i++) await timed(`${base}/api/kits`, kitInit(i));
const rssBefore = rssMb();

const health: number[] = [];
let healthErrors = 0;
let loading = true;
const healthLoop = (async () => {
  while (loading) {
    const r = await timed(`${base}/api/health`);
    if (r.ok) health.push(r.ms);
    else healthErrors++;
    await new Promise((resolve) => setTimeout(resolve, HEALTH_EVERY_MS));
  }
})();

const kits: number[] = [];
let kitErrors = 0;
let next = 0;
const started = performance.now();
await Promise.all(
  Array.from({ length: CONCURRENT }, async () => {
    while (next < KITS) {
      const r = await timed(`${base}/api/kits`, kitInit(next++));
      if (r.ok && r.bytes > 0) kits.push(r.ms);
      else kitErrors++;
    }
  }),
);
const seconds = (performance.now() - started) / 1000;
loading = false;
await healthLoop;
const rssAfter = rssMb();
child.kill('SIGTERM');
await new Promise((resolve) => child.on('exit', resolve));

console.log(`\nLoad: ${KITS} kit downloads, ${CONCURRENT} at a time (the three reference kits in turn), one server process`);
console.log(`  kits     ${line(kits)}; ${(KITS / seconds).toFixed(1)} kits/s; errors ${kitErrors}`);
console.log(`  health   ${line(health)}; errors ${healthErrors} (target: within ${HEALTH_TARGET_MS} ms)`);
console.log(`  memory   RSS ${rssBefore.toFixed(0)} MB before, ${rssAfter.toFixed(0)} MB after`);
console.log(`  target   ${pct(health, 99) <= HEALTH_TARGET_MS && kitErrors + healthErrors === 0 ? 'met' : 'NOT met'}`);
