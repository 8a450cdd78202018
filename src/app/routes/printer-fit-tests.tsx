import { Link, useParams } from 'react-router-dom';
import { Notice } from '../../components/ui/notice';
import { usePrinterProfile } from '../../features/printer-profiles/api/printer-profile';
import { FitTestsPanel } from '../../features/printer-profiles/components/fit-tests-panel';
import { useCurrentTeam } from '../../lib/session';
import { RequireSignIn } from './require-sign-in';

function PrinterFitTestsPage({ teamId, canEdit }: { teamId: string; canEdit: boolean }) {
  const { profileId = '' } = useParams();
  const { data: profile, isPending, error } = usePrinterProfile(teamId, profileId);
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <Link to="/printers" className="text-sm underline">
          Back to the printer profiles
        </Link>
        <h1 className="text-title font-bold">Fit tests{profile ? `: ${profile.name}` : ''}</h1>
        <p className="text-ink-soft">
          Measure once per printer and material which clearance really fits; the fit engine uses it from then on.
        </p>
      </header>
      {isPending && <Notice>Loading…</Notice>}
      {error && <Notice tone="error">This printer profile could not be loaded: {error.message}</Notice>}
      {profile && <FitTestsPanel key={profile.id} teamId={teamId} profile={profile} canEdit={canEdit} />}
    </div>
  );
}

function WithTeam() {
  const { team } = useCurrentTeam();
  if (!team) return null;
  return <PrinterFitTestsPage teamId={team.id} canEdit={team.role !== 'viewer'} />;
}

/** One printer's fit tests: the coupon, the answers, the derived calibration and the history. */
export function PrinterFitTestsRoute() {
  return (
    <RequireSignIn>
      <WithTeam />
    </RequireSignIn>
  );
}
