// Entry of a geometry worker thread (piscina). Plain JavaScript so that it loads the same way under
// `node --import tsx`, under vitest and in a bare worker: tsx's tsImport compiles the TypeScript tasks on
// the fly without registering a loader for the whole thread.
import { readlinkSync } from 'node:fs';
import { setPriority } from 'node:os';
import { tsImport } from 'tsx/esm/api';

// Geometry threads yield to the event loop: on Linux a nice value is per thread, so this thread (found by
// its id in /proc/thread-self) runs at a lower priority and the web server keeps answering while kits are
// built on every core. Elsewhere the threads keep the normal priority.
const LOWER_PRIORITY = 10;
try {
  const threadId = Number(readlinkSync('/proc/thread-self').split('/').pop());
  if (Number.isInteger(threadId)) setPriority(threadId, LOWER_PRIORITY);
} catch {
  // No /proc (not Linux) or not allowed: nothing to lower.
}

const tasks = await tsImport('./geometry-tasks.ts', import.meta.url);

export const kitZip = tasks.kitZip;
export const kitSummary = tasks.kitSummary;
export const couponZip = tasks.couponZip;
