import { useMemo, useRef, useState } from 'react';
import type { PreviewState } from '../../hooks/use-preview-build';
import { sectionView } from '../../lib/section-view';
import type { LengthUnit } from '../../lib/units';
import type { CameraCommands } from './camera-rig';
import { CanvasBoundary } from './canvas-boundary';
import { KitCanvas, type ViewMode } from './kit-canvas';
import { PREVIEW_COLORS } from './preview-colors';
import { GapLabel, SectionCaption } from './section-labels';
import { ViewToolbar } from './view-toolbar';

interface PreviewPanelProps {
  preview: PreviewState;
  unit: LengthUnit;
  /** The form has errors: the picture shows the last design that was valid. */
  formInvalid: boolean;
}

function statusText(preview: PreviewState, formInvalid: boolean): string {
  if (preview.busy) return 'Building the solids…';
  if (formInvalid) return 'Showing the last valid design: fix the marked fields to update it.';
  if (preview.failure) return 'Showing the last design that fitted: see the drawing below for what did not fit.';
  return preview.built ? 'Up to date.' : 'Starting the 3D view…';
}

/** The 3D preview with its view switcher, camera buttons, build status and the section's clearance label. */
export function PreviewPanel({ preview, unit, formInvalid }: PreviewPanelProps) {
  const [mode, setMode] = useState<ViewMode>('assembled');
  const [frame, setFrame] = useState<HTMLDivElement | null>(null);
  const camera = useRef<CameraCommands>(null);
  const built = preview.built;
  const gapLabel = useRef<HTMLDivElement>(null);
  const kit = built?.kit;
  const section = useMemo(() => (kit ? sectionView(kit) : null), [kit]);
  const stale = preview.busy || formInvalid || Boolean(preview.failure);
  return (
    <section aria-labelledby="preview-title" className="space-y-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="preview-title" className="text-lead font-bold">
          Preview
        </h2>
        <p
          role="status"
          aria-live="polite"
          className={`text-sm ${stale ? 'text-caution' : 'text-ink-soft'}`}
          data-testid="preview-status"
        >
          {preview.busy && (
            <span
              className="mr-2 inline-block size-3 animate-pulse rounded-full bg-caution align-middle"
              aria-hidden="true"
            />
          )}
          {statusText(preview, formInvalid)}
        </p>
      </div>
      <ViewToolbar mode={mode} onMode={setMode} camera={camera} />
      <div
        ref={setFrame}
        tabIndex={0}
        role="region"
        aria-label="3D view of the joint"
        aria-describedby="preview-help"
        className="relative aspect-[4/3] w-full overflow-hidden rounded-card border border-ink-faint bg-[#e6e1d6]"
        data-testid="preview-frame"
      >
        <CanvasBoundary>
          {built && (
            <KitCanvas
              kit={built.kit}
              buildId={built.id}
              mode={mode}
              section={section}
              cameraRef={camera}
              keyTarget={frame}
              gapLabel={gapLabel}
            />
          )}
        </CanvasBoundary>
        {built && mode === 'section' && section && (
          <GapLabel clearance={built.kit.manifest.clearancePerSide} unit={unit} pin={gapLabel} />
        )}
      </div>
      {built && mode === 'section' && section && (
        <SectionCaption manifest={built.kit.manifest} section={section} unit={unit} />
      )}
      <p id="preview-help" className="sr-only">
        Half A below the cut face and half B above it, drawn see-through so the pockets and keys show. Drag to turn,
        right-drag or arrow keys to pan, wheel to zoom; the buttons above do the same. Cut through shows a section
        through one key or rail, looking square at the cut.
      </p>
      <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink" aria-label="Colour key">
        <Legend color={PREVIEW_COLORS.halfA} label="Half A (below the cut)" />
        <Legend color={PREVIEW_COLORS.halfB} label="Half B (above the cut)" />
        <Legend
          color={PREVIEW_COLORS.key}
          label={built?.kit.manifest.request.joint === 'dovetail' ? 'Rails' : 'Keys'}
        />
        {mode !== 'section' && (
          <Legend
            color={PREVIEW_COLORS.pocket}
            label={built?.kit.manifest.request.joint === 'dovetail' ? 'Slots' : 'Pockets'}
          />
        )}
      </ul>
    </section>
  );
}

function Legend({ color, label }: { color: string; label: string }) {
  return (
    <li className="flex items-center gap-2">
      <span className="inline-block size-3 rounded-sm" style={{ background: color }} aria-hidden="true" />
      {label}
    </li>
  );
}
