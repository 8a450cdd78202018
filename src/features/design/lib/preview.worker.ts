/// <reference lib="webworker" />
// The preview worker: builds the kit's solids off the page's thread with the same shared/ code as the
// server, so typing in the form never freezes the screen. One message in, one message out.
import { GeometryError } from '../../../../shared/geometry/geometry-error';
import { buildKit } from '../../../../shared/kit/build-kit';
import { kitRequestSchema } from '../../../../shared/schemas/kit-request';
import { previewKit } from './preview-kit';
import { transferablesOf, type FromPreviewWorker, type ToPreviewWorker } from './preview-protocol';

declare const self: DedicatedWorkerGlobalScope;

function reply(message: FromPreviewWorker, transfer: Transferable[] = []): void {
  self.postMessage(message, transfer);
}

self.onmessage = (event: MessageEvent<ToPreviewWorker>) => {
  const message = event.data;
  try {
    const request = kitRequestSchema.parse(message.request);
    if (message.type === 'build') {
      const started = performance.now();
      const kit = previewKit(request);
      reply({ type: 'built', id: message.id, kit, buildMs: performance.now() - started }, transferablesOf(kit));
    } else {
      const file = buildKit(request).files.find((f) => f.name === message.file);
      if (!file) throw new Error(`this kit has no file named ${message.file}`);
      reply({ type: 'stl', id: message.id, file: file.name, bytes: file.bytes }, [file.bytes.buffer as ArrayBuffer]);
    }
  } catch (error) {
    const code = error instanceof GeometryError ? error.code : 'BUILD_FAILED';
    const text = error instanceof Error ? error.message : 'the kit could not be built';
    reply({ type: 'failed', id: message.id, code, message: text });
  }
};
