import type { ResolvedKitRequest } from '../../../../shared/schemas/kit-request';
import type { PreviewKit } from './preview-kit';
import type { FromPreviewWorker } from './preview-protocol';

/** A finished build as the screen uses it. `id` ties it to its performance marks. */
export interface BuiltPreview {
  readonly id: number;
  readonly kit: PreviewKit;
  readonly buildMs: number;
}

/** What the client tells the screen: a build landed, or the newest request failed. */
export interface PreviewClientEvents {
  onBuilt(built: BuiltPreview): void;
  onFailed(id: number, code: string, message: string): void;
  onBusy(busy: boolean): void;
}

// A build still running after this long when a newer request arrives is abandoned: the worker is
// replaced, so a huge request never holds the preview behind it.
const STALE_AFTER_MS = 250;

/** Performance mark names of one build; the screen marks the end when the new solids are drawn. */
export const previewMarks = (id: number) => ({
  start: `seamwright:edit:${id}`,
  received: `seamwright:received:${id}`,
  end: `seamwright:shown:${id}`,
});
/** The measure every shown build records: from the edit to the first frame with the new solids. */
export const PREVIEW_MEASURE = 'seamwright:preview-update';
/** The measure of the worker's own build time (plan, solids, meshes) for each shown build. */
export const WORKER_MEASURE = 'seamwright:worker-build';

/**
 * Talks to the preview worker: always builds the newest request, drops answers to older ones, and
 * restarts the worker when a long build is overtaken. STL files for single-part downloads come from the
 * same worker, built by the same code as the server's.
 */
export class PreviewClient {
  private worker: Worker;
  private nextId = 1;
  private latest = 0;
  private running: { id: number; since: number } | null = null;
  private pending: { id: number; request: ResolvedKitRequest } | null = null;
  private files = new Map<number, { resolve: (bytes: Uint8Array) => void; reject: (e: Error) => void }>();

  constructor(
    private readonly spawn: () => Worker,
    private readonly events: PreviewClientEvents,
  ) {
    this.worker = this.start();
  }

  /** Asks for a preview of `request`; returns its id (marked `seamwright:edit:<id>`). */
  build(request: ResolvedKitRequest): number {
    const id = this.nextId++;
    performance.mark(previewMarks(id).start);
    this.latest = id;
    if (!this.running) return (this.send(id, request), id);
    this.pending = { id, request };
    if (performance.now() - this.running.since > STALE_AFTER_MS) {
      this.worker.terminate();
      this.running = null;
      this.worker = this.start();
      this.flush();
    }
    return id;
  }

  /** One kit file's bytes, exactly as the server's zip holds it. */
  stl(request: ResolvedKitRequest, file: string): Promise<Uint8Array> {
    const id = this.nextId++;
    return new Promise((resolve, reject) => {
      this.files.set(id, { resolve, reject });
      // A separate short-lived worker, so a file download never waits behind (or cancels) a preview build.
      const once = this.spawn();
      once.onmessage = (event: MessageEvent<FromPreviewWorker>) => {
        once.terminate();
        this.settleFile(event.data);
      };
      once.postMessage({ type: 'stl', id, request, file });
    });
  }

  dispose(): void {
    this.worker.terminate();
  }

  private start(): Worker {
    const worker = this.spawn();
    worker.onmessage = (event: MessageEvent<FromPreviewWorker>) => this.receive(event.data);
    worker.onerror = (event) => {
      event.preventDefault();
      this.events.onFailed(
        this.latest,
        'WORKER_FAILED',
        'The 3D builder stopped unexpectedly; change a value to try again.',
      );
      this.running = null;
      this.events.onBusy(false);
    };
    return worker;
  }

  private send(id: number, request: ResolvedKitRequest): void {
    this.running = { id, since: performance.now() };
    this.events.onBusy(true);
    this.worker.postMessage({ type: 'build', id, request });
  }

  private flush(): void {
    const next = this.pending;
    this.pending = null;
    if (next) this.send(next.id, next.request);
    else this.events.onBusy(false);
  }

  private receive(message: FromPreviewWorker): void {
    if (message.type === 'stl') return;
    this.running = null;
    // Answers to requests that were overtaken are dropped: only the newest one is ever shown.
    if (message.id === this.latest) {
      if (message.type === 'built') {
        performance.mark(previewMarks(message.id).received);
        performance.measure(WORKER_MEASURE, { start: performance.now() - message.buildMs, duration: message.buildMs });
        this.events.onBuilt({ id: message.id, kit: message.kit, buildMs: message.buildMs });
      } else this.events.onFailed(message.id, message.code, message.message);
    }
    this.flush();
  }

  private settleFile(message: FromPreviewWorker): void {
    const waiting = this.files.get(message.id);
    if (!waiting) return;
    this.files.delete(message.id);
    if (message.type === 'stl') waiting.resolve(message.bytes);
    else if (message.type === 'failed') waiting.reject(new Error(message.message));
  }
}
