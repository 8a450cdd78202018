import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { ParsedPresetInput, Preset } from '../../../shared/schemas/preset';
import { Notice } from '../../components/ui/notice';
import { usePreset } from '../../features/presets/api/get-preset';
import { conflictOf, useUpdatePreset } from '../../features/presets/api/update-preset';
import { ConflictNotice } from '../../features/presets/components/conflict-notice';
import { PresetForm } from '../../features/presets/components/preset-form';
import { PresetReadOnly } from '../../features/presets/components/preset-read-only';
import { PresetVersions } from '../../features/presets/components/preset-versions';
import { usePrinterChoices } from '../../features/printer-profiles/api/printer-profiles';
import { useCurrentTeam } from '../../lib/session';
import { RequireSignIn } from './require-sign-in';

const formValues = (p: Preset) => ({
  name: p.name,
  description: p.description,
  tags: p.tags,
  printerProfileId: p.printerProfileId,
  settings: p.settings,
});

function PresetEditor({ teamId, preset }: { teamId: string; preset: Preset }) {
  const printers = usePrinterChoices(teamId);
  const update = useUpdatePreset(teamId, preset.id);
  // The version this edit started from: a save sends it, and the server refuses it once someone saved since.
  const [base, setBase] = useState(preset);
  const [pending, setPending] = useState<ParsedPresetInput | null>(null);
  const [conflict, setConflict] = useState<Preset | null>(null);
  const [saved, setSaved] = useState<number | null>(null);
  // A failure of "save mine" other than a new conflict (network, role taken away): the form is locked, so say it here.
  const [overwriteError, setOverwriteError] = useState<string | null>(null);
  const save = async (values: ParsedPresetInput, baseVersion: number) => {
    setOverwriteError(null);
    try {
      const result = await update.mutateAsync({ ...values, baseVersion } as never);
      setBase(result);
      setConflict(null);
      setSaved(result.version);
    } catch (error) {
      const current = conflictOf(error);
      if (!current) throw error;
      setPending(values);
      setConflict(current);
    }
  };
  return (
    <div className="space-y-4">
      {saved && !conflict && <Notice tone="success">Saved as version {saved}.</Notice>}
      {conflict && pending && (
        <ConflictNotice
          current={conflict}
          busy={update.isPending}
          onLoadCurrent={() => {
            setBase(conflict);
            setConflict(null);
            setSaved(null);
          }}
          onOverwrite={() => save(pending, conflict.version).catch((e: Error) => setOverwriteError(e.message))}
        />
      )}
      {conflict && overwriteError && <Notice tone="error">{overwriteError}</Notice>}
      <PresetForm
        key={`${base.id}-${base.version}`}
        initial={formValues(base) as never}
        printers={printers}
        submitLabel={`Save as version ${base.version + 1}`}
        disabled={conflict !== null}
        disabledReason="Choose above: load the newer version, or save yours after it."
        onSubmit={(v) => save(v, base.version)}
      />
    </div>
  );
}

function PresetPage() {
  const { presetId = '' } = useParams();
  const { team } = useCurrentTeam();
  const { data: preset, isPending, error } = usePreset(team?.id ?? '', presetId);
  if (!team) return null;
  if (isPending) return <Notice>Loading the preset…</Notice>;
  if (error) {
    return (
      <div className="space-y-4">
        <h1 className="text-title font-bold">This preset could not be opened</h1>
        <Notice tone="error">{error.message}</Notice>
        <Link to="/presets" className="inline-block font-medium underline">
          Back to all presets
        </Link>
      </div>
    );
  }
  const canEdit = team.role !== 'viewer';
  return (
    <div className="space-y-8">
      <header className="space-y-1">
        <Link to="/presets" className="text-sm underline">
          All presets
        </Link>
        <h1 className="text-title font-bold">{preset.name}</h1>
        <p className="text-ink-soft">
          Version {preset.version}
          {preset.archived && ' · archived'} · saved {new Date(preset.updatedAt).toLocaleString()} by{' '}
          {preset.updatedBy?.name ?? 'a former member'}
        </p>
        <p>
          <Link
            to={`/design?preset=${preset.id}`}
            className="inline-block rounded-md bg-kiln px-4 py-2 font-medium text-white hover:bg-ink"
          >
            Open in the designer
          </Link>{' '}
          <span className="text-sm text-ink-soft">
            to see it on a face, change any setting{canEdit ? ' and save it as the next version' : ''}.
          </span>
        </p>
      </header>
      {canEdit ? (
        <PresetEditor teamId={team.id} preset={preset} />
      ) : (
        <PresetReadOnly preset={preset} teamName={team.name} />
      )}
      <section aria-labelledby="history" className="space-y-3">
        <h2 id="history" className="text-lead font-bold">
          Versions
        </h2>
        <PresetVersions teamId={team.id} presetId={preset.id} currentVersion={preset.version} canEdit={canEdit} />
      </section>
    </div>
  );
}

/** One preset: edit it (each save a version, stale saves caught) and its version history with restore. */
export function PresetDetailRoute() {
  return (
    <RequireSignIn>
      <PresetPage />
    </RequireSignIn>
  );
}
