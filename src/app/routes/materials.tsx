import { MaterialCatalogue } from '../../features/materials/components/material-catalogue';
import { TeamMaterials } from '../../features/materials/components/team-materials';
import { useCurrentTeam } from '../../lib/session';
import { RequireSignIn } from './require-sign-in';

function MaterialsPage() {
  const { team } = useCurrentTeam();
  if (!team) return null;
  return (
    <div className="space-y-10">
      <h1 className="text-title font-bold">Materials</h1>
      <section aria-labelledby="team-materials" className="space-y-3">
        <h2 id="team-materials" className="text-lead font-bold">
          {team.name}’s materials
        </h2>
        <TeamMaterials teamId={team.id} canEdit={team.role !== 'viewer'} canDelete={team.role === 'owner'} />
      </section>
      <section aria-labelledby="catalogue" className="space-y-3">
        <h2 id="catalogue" className="text-lead font-bold">
          Built-in catalogue
        </h2>
        <p className="text-ink-soft">
          Read-only: the numbers the fit engine starts from, each with where it comes from.
        </p>
        <MaterialCatalogue teamId={team.id} />
      </section>
    </div>
  );
}

/** Team materials and the built-in catalogue with its sources. */
export function MaterialsRoute() {
  return (
    <RequireSignIn>
      <MaterialsPage />
    </RequireSignIn>
  );
}
