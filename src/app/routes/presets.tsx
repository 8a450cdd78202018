import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { Notice } from '../../components/ui/notice';
import { useCreatePreset } from '../../features/presets/api/create-preset';
import { ImportPresets } from '../../features/presets/components/import-presets';
import { PresetForm } from '../../features/presets/components/preset-form';
import { PresetsTable } from '../../features/presets/components/presets-table';
import { usePrinterChoices } from '../../features/printer-profiles/api/printer-profiles';
import { useCurrentTeam } from '../../lib/session';
import { RequireSignIn } from './require-sign-in';

const blank = {
  name: '',
  description: '',
  tags: [],
  printerProfileId: null,
  settings: { joint: 'key', material: 'PLA', fit: 'snug', key: { shape: 'square', width: 10, depth: 8 } },
} as const;

function PresetsPage() {
  const { team } = useCurrentTeam();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const create = useCreatePreset(team?.id ?? '');
  const printers = usePrinterChoices(team?.id ?? '');
  if (!team) return null;
  const canEdit = team.role !== 'viewer';
  return (
    <div className="space-y-8">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 className="text-title font-bold">Presets</h1>
          <p className="text-ink-soft">
            Joint settings {team.name} tunes once and reuses. Every save is kept as a version.
          </p>
        </div>
        {canEdit && !creating && <Button onClick={() => setCreating(true)}>New preset</Button>}
      </header>
      {!canEdit && (
        <Notice>
          You are a viewer of {team.name}: you can open and use these presets, but only editors and owners can add or
          change them.
        </Notice>
      )}
      {creating && (
        <section aria-labelledby="new-preset" className="space-y-3">
          <h2 id="new-preset" className="text-lead font-bold">
            New preset
          </h2>
          <PresetForm
            initial={blank as never}
            printers={printers}
            submitLabel="Save preset"
            onSubmit={async (values) => {
              const saved = await create.mutateAsync(values as never);
              navigate(`/presets/${saved.id}`);
            }}
          />
        </section>
      )}
      <PresetsTable teamId={team.id} printers={printers} canEdit={canEdit} canDelete={team.role === 'owner'} />
      <section aria-labelledby="transfer" className="space-y-3">
        <h2 id="transfer" className="text-lead font-bold">
          Export and import
        </h2>
        <ImportPresets teamId={team.id} canImport={canEdit} />
      </section>
    </div>
  );
}

/** The team's presets: list with search and filters, a new-preset form, export and import. */
export function PresetsRoute() {
  return (
    <RequireSignIn>
      <PresetsPage />
    </RequireSignIn>
  );
}
