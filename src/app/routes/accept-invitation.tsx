import { useEffect, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { AcceptInvitationPanel } from '../../features/team/components/accept-invitation-panel';
import { Notice } from '../../components/ui/notice';
import { forgetInvitation, pendingInvitation, readLinkToken, rememberInvitation } from '../../lib/link-token';
import { useCurrentTeam } from '../../lib/session';

/** The page an invitation link opens; the token is kept for the tab until it is used. */
export function AcceptInvitationRoute() {
  const [token] = useState(() => readLinkToken() ?? pendingInvitation());
  const { switchTo } = useCurrentTeam();
  const navigate = useNavigate();
  useEffect(() => {
    if (token) rememberInvitation(token);
  }, [token]);
  return (
    <section className="max-w-xl space-y-6">
      <h1 className="text-title font-bold">Team invitation</h1>
      {token ? (
        <AcceptInvitationPanel
          token={token}
          onAccepted={(teamId) => {
            forgetInvitation();
            switchTo(teamId);
            navigate('/team');
          }}
        />
      ) : (
        <Notice tone="error">This link is incomplete. Open the link from the invitation e-mail again.</Notice>
      )}
    </section>
  );
}
