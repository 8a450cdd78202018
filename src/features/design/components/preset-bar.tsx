import { useEffect, useId, useRef, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import type { Preset } from '../../../../shared/schemas/preset';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import type { useDesignPresets } from '../hooks/use-design-presets';
import type { DesignLibrary } from '../lib/design-library';
import { inputClass } from './form/field-parts';
import { NewPresetForm } from './new-preset-form';

const linkClass = 'font-medium text-ink underline underline-offset-4';
const messageOf = (error: unknown) => (error instanceof Error ? error.message : 'Something went wrong.');

interface PresetBarProps {
  library: DesignLibrary | null;
  presets: ReturnType<typeof useDesignPresets>;
  /** presetText of the form now, to tell whether the design still matches its preset. */
  currentText: string;
  /** The form has errors: nothing can be saved until they are fixed. */
  invalid: boolean;
}

type Status = { tone: 'success' | 'error'; text: string } | null;

/**
 * The team's presets on the design screen: start from one (also from a link, /design?preset=<id>), save the
 * design as a new preset, or as the next version of the one it came from. A stale save shows what the other
 * person saved and lets the maker keep both as versions, or take theirs.
 */
export function PresetBar({ library, presets, currentText, invalid }: PresetBarProps) {
  const selectId = useId();
  const namingId = useId();
  const [params, setParams] = useSearchParams();
  const [choice, setChoice] = useState('');
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<Status>(null);
  const [conflict, setConflict] = useState<Preset | null>(null);
  const [naming, setNaming] = useState(false);
  const linked = params.get('preset');
  const loadedLink = useRef<string | null>(null);
  const { origin, load, apply, saveVersion } = presets;

  const run = async (work: () => Promise<Status>) => {
    setBusy(true);
    setStatus(null);
    try {
      setStatus(await work());
    } catch (error) {
      setStatus({ tone: 'error', text: messageOf(error) });
    } finally {
      setBusy(false);
    }
  };

  // A link from a preset's page opens the design screen with that preset loaded, once.
  useEffect(() => {
    if (!library?.ready || !linked || loadedLink.current === linked) return;
    loadedLink.current = linked;
    void run(async () => {
      await load(linked);
      setParams({}, { replace: true });
      return null;
    });
  }, [library, linked]); // once per linked id; `run` and `load` change with every render

  if (!library) {
    return (
      <p className="text-sm text-ink-soft">
        <Link to="/sign-in" className={linkClass}>
          Sign in
        </Link>{' '}
        to start from your team’s presets, save this setup as one and keep a history of your kits.
      </p>
    );
  }

  const changed = origin !== null && origin.settingsText !== currentText;
  const saveOver = (baseVersion: number) =>
    run(async () => {
      const result = await saveVersion(baseVersion);
      if (result.kind === 'conflict') {
        setConflict(result.current);
        return null;
      }
      setConflict(null);
      return { tone: 'success', text: `Saved as version ${result.preset.version} of “${result.preset.name}”.` };
    });

  return (
    <section aria-labelledby="design-presets-title" className="space-y-3">
      <h2 id="design-presets-title" className="text-lead font-bold">
        Presets of {library.teamName}
      </h2>
      {origin && (
        <p className="text-sm" data-testid="preset-origin">
          From preset <strong>{origin.name}</strong>, version {origin.version}
          {changed ? ' — changed since, not saved yet.' : ' — unchanged.'}
        </p>
      )}
      <div className="flex flex-wrap items-end gap-2">
        <div className="min-w-0 flex-1 basis-48 space-y-1">
          <label htmlFor={selectId} className="block font-medium">
            Start from a preset
          </label>
          <select
            id={selectId}
            value={choice}
            onChange={(e) => setChoice(e.target.value)}
            className={inputClass(false)}
          >
            <option value="">{library.presets.length ? 'Choose a preset…' : 'No presets in this team yet'}</option>
            {library.presets.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name} (version {p.version})
              </option>
            ))}
          </select>
        </div>
        <Button
          variant="quiet"
          disabled={!choice || busy || !library.ready}
          onClick={() =>
            run(async () => {
              await load(choice);
              setConflict(null);
              return null;
            })
          }
        >
          Use this preset
        </Button>
      </div>
      {library.canEdit ? (
        <div className="flex flex-wrap gap-2">
          {origin && (
            <Button disabled={busy || invalid || !changed} onClick={() => saveOver(origin.version)}>
              Save as version {origin.version + 1} of “{origin.name}”
            </Button>
          )}
          <Button
            variant="quiet"
            disabled={busy || invalid}
            aria-expanded={naming}
            aria-controls={namingId}
            onClick={() => setNaming((n) => !n)}
          >
            Save as a new preset…
          </Button>
        </div>
      ) : (
        <p className="text-sm text-ink-soft">
          You are a viewer in {library.teamName}: you can start from its presets, and an editor can save new ones.
        </p>
      )}
      {invalid && library.canEdit && <p className="text-sm text-ink-soft">Fix the marked settings to save.</p>}
      {naming && library.canEdit && (
        <NewPresetForm
          id={namingId}
          presets={presets}
          onDone={(preset) => {
            setNaming(false);
            setConflict(null);
            setStatus({ tone: 'success', text: `Saved as the new preset “${preset.name}”.` });
          }}
          onCancel={() => setNaming(false)}
        />
      )}
      {conflict && origin && (
        <Notice tone="warning">
          <p className="font-medium">
            Someone saved version {conflict.version} of “{conflict.name}” while you worked on version {origin.version}
            {conflict.updatedBy
              ? ` (${conflict.updatedBy.name}, ${new Date(conflict.updatedAt).toLocaleString()})`
              : ''}
            .
          </p>
          <p className="mt-1 text-sm">
            Nothing was overwritten. Keep both by saving yours as the next version, or take theirs (your changes on
            screen are replaced).
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button disabled={busy} onClick={() => saveOver(conflict.version)}>
              Save mine as version {conflict.version + 1}
            </Button>
            <Button
              variant="quiet"
              disabled={busy}
              onClick={() => {
                apply(conflict);
                setConflict(null);
                setStatus({ tone: 'success', text: `Loaded version ${conflict.version} of “${conflict.name}”.` });
              }}
            >
              Take theirs
            </Button>
          </div>
        </Notice>
      )}
      {status && <Notice tone={status.tone}>{status.text}</Notice>}
    </section>
  );
}
