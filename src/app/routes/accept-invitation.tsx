import { useEffect, useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { accountQueryOptions } from '../../features/account/api/get-account';
import { VerifyReminder } from '../../features/auth/components/verify-reminder';
import { AcceptInvitationPanel } from '../../features/team/components/accept-invitation-panel';
import { Notice } from '../../components/ui/notice';
import { forgetInvitation, pendingInvitation, readLinkToken, rememberInvitation } from '../../lib/link-token';
import { useCurrentTeam, useMe } from '../../lib/session';

/** The page an invitation link opens; the token is kept for the tab until it is used. */
export function AcceptInvitationRoute() {
  const [token] = useState(() => readLinkToken() ?? pendingInvitation());
  const { switchTo } = useCurrentTeam();
  const { data: me } = useMe();
  // Accepting needs a confirmed address; the account query says whether it is (only asked when signed in).
  // If that lookup fails, the button is left to the server, whose refusal names the reason.
  const account = useQuery({ ...accountQueryOptions(), enabled: Boolean(me) });
  const verified = account.isError ? true : account.data?.emailVerified;
  const navigate = useNavigate();
  useEffect(() => {
    if (token) rememberInvitation(token);
  }, [token]);
  return (
    <section className="max-w-xl space-y-6">
      <h1 className="text-title font-bold">Team invitation</h1>
      {token && me && account.data && !account.data.emailVerified && <VerifyReminder email={account.data.email} />}
      {token ? (
        <AcceptInvitationPanel
          token={token}
          verified={verified}
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
