import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { AppError } from '../errors/app-error';
import { withKitBudget } from './kit-budget';
import { unwrap, type Geometry, type TaskResult } from './geometry';

/** {@link Geometry} on worker threads, plus what the server needs to watch and stop them. */
export interface GeometryPool extends Geometry {
  /** Threads running, tasks waiting and tasks done, for the benchmark. */
  stats(): { threads: number; queued: number; completed: number };
  close(): Promise<void>;
}

export interface GeometryPoolOptions {
  /** Worker threads; default one per core the machine offers. */
  threads?: number;
  /** Tasks that may wait for a thread before new ones are refused with 503; default 256. */
  maxQueue?: number;
}

// Room for the largest kit the budget allows while keeping a runaway request from taking the whole machine.
const WORKER_HEAP_MB = 1536;
// Idle threads go after a minute; one stays warm so the first kit after a pause needs no compile.
const IDLE_TIMEOUT_MS = 60_000;

const busy = () =>
  new AppError('SERVICE_UNAVAILABLE', 'Seamwright is building many kits right now. Please try again in a few seconds.');

/**
 * Starts a pool of geometry worker threads (piscina) so the web server's event loop never computes solids.
 * A task's GeometryError comes back as a GeometryError (the error handler answers 422 with its numbers), a
 * kit over the work budget is refused before it is queued, and a full queue answers 503.
 *
 * @param options - thread count and queue length, see {@link GeometryPoolOptions}
 * @returns the pool; close it on shutdown
 */
export function createGeometryPool(options: GeometryPoolOptions = {}): GeometryPool {
  const maxQueue = options.maxQueue ?? 256;
  const pool = new Piscina({
    filename: new URL('./geometry-worker.mjs', import.meta.url).href,
    minThreads: 1,
    maxThreads: options.threads ?? availableParallelism(),
    maxQueue,
    idleTimeout: IDLE_TIMEOUT_MS,
    resourceLimits: { maxOldGenerationSizeMb: WORKER_HEAP_MB },
  });
  const run =
    <T>(name: string) =>
    async (task: unknown): Promise<T> => {
      if (pool.queueSize >= maxQueue) throw busy();
      return unwrap(await (pool.run(task, { name }) as Promise<TaskResult<T>>));
    };
  return {
    ...withKitBudget({ kitZip: run('kitZip'), kitSummary: run('kitSummary'), couponZip: run('couponZip') }),
    stats: () => ({ threads: pool.threads.length, queued: pool.queueSize, completed: pool.completed }),
    close: () => pool.close(),
  };
}

let shared: GeometryPool | undefined;

/** The process's one geometry pool, started on first use (the apps a test file builds share it). */
export function sharedGeometryPool(): GeometryPool {
  shared ??= createGeometryPool();
  return shared;
}
