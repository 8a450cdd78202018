import { useRef, useState } from 'react';
import type { PreviewState } from '../../hooks/use-preview-build';
import { withUnit, type LengthUnit } from '../../lib/units';
import type { CameraCommands } from './camera-rig';
import { CanvasBoundary } from './canvas-boundary';
import { KitCanvas, type ViewMode } from './kit-canvas';
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
  const positions = built?.kit.manifest.parts.find((p) => p.positions)?.positions ?? [];
  const request = built?.kit.manifest.request;
  const sectionY = request?.joint === 'key' ? (positions[0]?.[1] ?? 0) : 0;
  const sectionX = positions[0]?.[0] ?? 0;
  // Frame one key or rail and its neighbourhood, close enough that a tenth of a millimetre shows.
  const sectionSpan =
    request?.joint === 'key'
      ? Math.max(request.key.width, request.key.depth)
      : request
        ? request.dovetail.rootWidth + request.dovetail.height
        : 10;
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
      <ViewToolbar
        mode={mode}
        onMode={(m) => {
          setMode(m);
          if (m === 'section') camera.current?.lookAtSection(sectionX, sectionY, sectionSpan);
        }}
        camera={camera}
      />
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
              sectionY={sectionY}
              cameraRef={camera}
              keyTarget={frame}
            />
          )}
        </CanvasBoundary>
        {built && mode === 'section' && (
          <p
            className="absolute top-3 left-3 max-w-[80%] rounded-md bg-paper/95 px-3 py-2 text-sm text-ink shadow"
            data-testid="section-label"
          >
            Cut at y = {withUnit(sectionY, unit)} through the{' '}
            {built.kit.manifest.request.joint === 'key' ? 'keys' : 'rails'}:{' '}
            <strong>clearance {withUnit(built.kit.manifest.clearancePerSide, unit)} per side</strong> between{' '}
            {built.kit.manifest.request.joint === 'key' ? 'each key and its pocket wall' : 'each rail and its slot'}.
          </p>
        )}
      </div>
      <p id="preview-help" className="sr-only">
        Half A below the cut face and half B above it, drawn see-through so the pockets and keys show. Drag to turn,
        right-drag or arrow keys to pan, wheel to zoom; the buttons above do the same.
      </p>
      <ul className="flex flex-wrap gap-x-5 gap-y-1 text-sm text-ink" aria-label="Colour key">
        <Legend color="#3f5f72" label="Half A (below the cut)" />
        <Legend color="#b0764a" label="Half B (above the cut)" />
        <Legend color="#3d6a4c" label={built?.kit.manifest.request.joint === 'dovetail' ? 'Rails' : 'Keys'} />
        <Legend color="#a8471f" label={built?.kit.manifest.request.joint === 'dovetail' ? 'Slots' : 'Pockets'} />
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
