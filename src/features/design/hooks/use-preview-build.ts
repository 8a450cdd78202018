import { useCallback, useEffect, useRef, useState } from 'react';
import type { ResolvedKitRequest } from '../../../../shared/schemas/kit-request';
import { PreviewClient, type BuiltPreview } from '../lib/preview-client';

const spawnWorker = () => new Worker(new URL('../lib/preview.worker.ts', import.meta.url), { type: 'module' });

/** The preview's state: the newest build that worked, the newest failure (if it is newer), and whether one runs. */
export interface PreviewState {
  readonly built: BuiltPreview | null;
  readonly failure: { id: number; code: string; message: string } | null;
  readonly busy: boolean;
  /** One kit file's bytes from the worker, as the zip would hold it. */
  readonly stl: (file: string) => Promise<Uint8Array>;
}

/**
 * Builds the kit for `request` in the preview worker whenever it changes (null = the form has errors, keep
 * the last build). Stale builds are dropped; see {@link PreviewClient}.
 */
export function usePreviewBuild(request: ResolvedKitRequest | null): PreviewState {
  const [built, setBuilt] = useState<BuiltPreview | null>(null);
  const [failure, setFailure] = useState<PreviewState['failure']>(null);
  const [busy, setBusy] = useState(false);
  const client = useRef<PreviewClient | null>(null);
  const latestRequest = useRef(request);

  useEffect(() => {
    const c = new PreviewClient(spawnWorker, {
      onBuilt: (b) => {
        setBuilt(b);
        setFailure(null);
      },
      onFailed: (id, code, message) => setFailure({ id, code, message }),
      onBusy: setBusy,
    });
    client.current = c;
    return () => {
      c.dispose();
      client.current = null;
    };
  }, []);

  useEffect(() => {
    latestRequest.current = request;
    if (request) client.current?.build(request);
  }, [request]);

  const stl = useCallback((file: string) => {
    const r = latestRequest.current;
    if (!client.current || !r) return Promise.reject(new Error('fix the form first'));
    return client.current.stl(r, file);
  }, []);
  return { built, failure, busy, stl };
}
