import { useState } from 'react';
import type { PrinterProfile, PrinterProfileInput } from '../../../shared/schemas/printer-profile';
import { Button } from '../../components/ui/button';
import { useSavePrinterProfile } from '../../features/printer-profiles/api/save-printer-profile';
import { PrinterProfileForm } from '../../features/printer-profiles/components/printer-profile-form';
import { PrinterProfilesTable } from '../../features/printer-profiles/components/printer-profiles-table';
import { useCurrentTeam } from '../../lib/session';
import { RequireSignIn } from './require-sign-in';

const blank: PrinterProfileInput = {
  name: '',
  process: 'fdm',
  buildVolume: { x: 220, y: 220, z: 250 },
  nozzleDiameter: 0.4,
  layerHeight: 0.2,
  notes: '',
  calibration: [],
};

function PrinterProfilesPage() {
  const { team } = useCurrentTeam();
  const save = useSavePrinterProfile(team?.id ?? '');
  const [editing, setEditing] = useState<PrinterProfile | 'new' | null>(null);
  if (!team) return null;
  const canEdit = team.role !== 'viewer';
  return (
    <div className="space-y-8">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 className="text-title font-bold">Printer profiles</h1>
          <p className="text-ink-soft">
            Each printer’s calibration: the fit engine adds its offset for the chosen material and fit.
          </p>
        </div>
        {canEdit && !editing && <Button onClick={() => setEditing('new')}>New printer profile</Button>}
      </header>
      {editing && (
        <section aria-labelledby="edit-printer" className="space-y-3">
          <h2 id="edit-printer" className="text-lead font-bold">
            {editing === 'new' ? 'New printer profile' : `Edit ${editing.name}`}
          </h2>
          <PrinterProfileForm
            key={editing === 'new' ? 'new' : editing.id}
            initial={editing === 'new' ? blank : editing}
            onSubmit={async (body) => {
              await save.mutateAsync({ body, id: editing === 'new' ? undefined : editing.id });
              setEditing(null);
            }}
          />
          <Button variant="quiet" onClick={() => setEditing(null)}>
            Cancel
          </Button>
        </section>
      )}
      <PrinterProfilesTable teamId={team.id} canEdit={canEdit} canDelete={team.role === 'owner'} onEdit={setEditing} />
    </div>
  );
}

/** The team's printer profiles and their calibration tables. */
export function PrinterProfilesRoute() {
  return (
    <RequireSignIn>
      <PrinterProfilesPage />
    </RequireSignIn>
  );
}
