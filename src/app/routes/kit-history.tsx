import { KitHistoryTable } from '../../features/kit-history/components/kit-history-table';
import { usePrinterChoices } from '../../features/printer-profiles/api/printer-profiles';
import { useCurrentTeam } from '../../lib/session';
import { RequireSignIn } from './require-sign-in';

function KitHistoryPage() {
  const { team } = useCurrentTeam();
  const printers = usePrinterChoices(team?.id ?? '');
  if (!team) return null;
  return (
    <div className="space-y-6">
      <header>
        <h1 className="text-title font-bold">Kit history</h1>
        <p className="text-ink-soft">
          Every kit {team.name} downloaded. Downloading one again rebuilds it and checks it byte for byte.
        </p>
      </header>
      <KitHistoryTable teamId={team.id} printers={printers} />
    </div>
  );
}

/** The team's kit history with re-download. */
export function KitHistoryRoute() {
  return (
    <RequireSignIn>
      <KitHistoryPage />
    </RequireSignIn>
  );
}
