import type { RefObject } from 'react';
import type { CameraCommands } from './camera-rig';
import type { ViewMode } from './kit-canvas';

const modes: Array<{ value: ViewMode; label: string }> = [
  { value: 'assembled', label: 'Together' },
  { value: 'exploded', label: 'Pulled apart' },
  { value: 'section', label: 'Cut through' },
];

const tool = 'rounded-md border border-ink-faint bg-white px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-deep';

/** View switcher and camera buttons: every camera move has a button, so the mouse is optional. */
export function ViewToolbar({
  mode,
  onMode,
  camera,
}: {
  mode: ViewMode;
  onMode: (m: ViewMode) => void;
  camera: RefObject<CameraCommands | null>;
}) {
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
      <div role="group" aria-label="View" className="flex gap-1">
        {modes.map((m) => (
          <button
            key={m.value}
            type="button"
            aria-pressed={mode === m.value}
            onClick={() => onMode(m.value)}
            className={`rounded-md border px-3 py-1.5 text-sm font-medium ${mode === m.value ? 'border-ink bg-ink text-paper' : 'border-ink-faint bg-white text-ink hover:bg-paper-deep'}`}
          >
            {m.label}
          </button>
        ))}
      </div>
      <div role="group" aria-label="Camera" className="flex flex-wrap gap-1">
        <button type="button" className={tool} onClick={() => camera.current?.turn(-20)}>
          Turn left
        </button>
        <button type="button" className={tool} onClick={() => camera.current?.turn(20)}>
          Turn right
        </button>
        <button type="button" className={tool} onClick={() => camera.current?.zoom(0.8)}>
          Closer
        </button>
        <button type="button" className={tool} onClick={() => camera.current?.zoom(1.25)}>
          Farther
        </button>
        <button type="button" className={tool} onClick={() => camera.current?.reset()}>
          Reset view
        </button>
      </div>
    </div>
  );
}
