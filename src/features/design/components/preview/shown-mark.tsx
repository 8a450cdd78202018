import { useFrame, useThree } from '@react-three/fiber';
import { useLayoutEffect, useRef } from 'react';
import { PREVIEW_MEASURE, previewMarks } from '../../lib/preview-client';

/**
 * Marks the moment a build's solids are first drawn: `seamwright:shown:<id>`, and a measure
 * `seamwright:preview-update` from the edit that asked for it. The mark is queued from the frame
 * callback, which runs just before the renderer draws, so it lands right after the draw call.
 */
export function ShownMark({ buildId }: { buildId: number }) {
  const pending = useRef<number | null>(null);
  const invalidate = useThree((s) => s.invalidate);
  useLayoutEffect(() => {
    pending.current = buildId;
    invalidate();
  }, [buildId, invalidate]);
  useFrame(() => {
    const id = pending.current;
    if (id === null) return;
    pending.current = null;
    queueMicrotask(() => {
      const { start, end } = previewMarks(id);
      performance.mark(end);
      if (performance.getEntriesByName(start).length > 0) performance.measure(PREVIEW_MEASURE, start, end);
    });
  });
  return null;
}
