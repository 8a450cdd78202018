import { useAccount } from '../../features/account/api/get-account';
import { VerifyReminder } from '../../features/auth/components/verify-reminder';
import { AuditLog } from '../../features/team/components/audit-log';
import { CreateTeamForm } from '../../features/team/components/create-team-form';
import { InvitationsList } from '../../features/team/components/invitations-list';
import { InviteForm } from '../../features/team/components/invite-form';
import { MembersTable } from '../../features/team/components/members-table';
import { useTeamDetail } from '../../features/team/api/team-detail';
import { TeamSettings } from '../../features/team/components/team-settings';
import { useCurrentTeam, useMe } from '../../lib/session';
import { RequireSignIn } from './require-sign-in';

function TeamPage() {
  const { data: me } = useMe();
  const { data: account } = useAccount();
  const { team, teams, switchTo } = useCurrentTeam();
  const { data: detail } = useTeamDetail(team?.id ?? '');
  if (!me || !team) return null;
  const isOwner = team.role === 'owner';
  return (
    <div className="space-y-10">
      <header className="space-y-1">
        <h1 className="text-title font-bold">{team.name}</h1>
        <p className="text-ink-soft">You are {team.role === 'owner' ? 'an owner' : `a ${team.role}`} of this team.</p>
      </header>
      {account && !account.emailVerified && <VerifyReminder email={account.email} />}
      <section aria-labelledby="members" className="space-y-3">
        <h2 id="members" className="text-lead font-bold">
          Members
        </h2>
        <MembersTable teamId={team.id} myUserId={me.user.id} isOwner={isOwner} />
      </section>
      {isOwner && (
        <>
          <section aria-labelledby="invite" className="space-y-3">
            <h2 id="invite" className="text-lead font-bold">
              Invite someone
            </h2>
            <InviteForm teamId={team.id} />
            <h3 className="pt-2 font-bold">Pending invitations</h3>
            <InvitationsList teamId={team.id} />
          </section>
          {detail && detail.id === team.id && (
            <section aria-labelledby="team-settings" className="space-y-3">
              <h2 id="team-settings" className="text-lead font-bold">
                Team settings
              </h2>
              <TeamSettings
                key={detail.id}
                team={detail}
                onDeleted={() => switchTo(teams.find((t) => t.id !== team.id)?.id ?? '')}
              />
            </section>
          )}
          <section aria-labelledby="audit" className="space-y-3">
            <h2 id="audit" className="text-lead font-bold">
              Audit log
            </h2>
            <AuditLog teamId={team.id} />
          </section>
        </>
      )}
      <section aria-labelledby="new-team" className="space-y-3">
        <h2 id="new-team" className="text-lead font-bold">
          Start another team
        </h2>
        <CreateTeamForm onCreated={switchTo} />
      </section>
    </div>
  );
}

/** The current team: members, invitations and audit log (the last two for owners). */
export function TeamRoute() {
  return (
    <RequireSignIn>
      <TeamPage />
    </RequireSignIn>
  );
}
