import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useMe } from '../../../lib/session';
import { useAcceptInvitation, useInvitationPreview } from '../api/accept-invitation';

/** Shows what an invitation offers and lets the invited, signed-in person accept it. */
export function AcceptInvitationPanel({ token, onAccepted }: { token: string; onAccepted: (teamId: string) => void }) {
  const preview = useInvitationPreview(token);
  const { data: me } = useMe();
  const accept = useAcceptInvitation();
  if (preview.isPending) return <Notice>Opening the invitation…</Notice>;
  if (preview.isError) return <Notice tone="error">{preview.error.message}</Notice>;
  const inv = preview.data;
  return (
    <div className="space-y-4">
      <p className="text-lead">
        {inv.invitedBy ?? 'A team owner'} invited <strong className="break-all">{inv.email}</strong> to join{' '}
        <strong>{inv.teamName}</strong> as {inv.role}.
      </p>
      {!me ? (
        <Notice>
          <Link to="/sign-in" className="underline">
            Sign in
          </Link>{' '}
          or{' '}
          <Link to="/sign-up" className="underline">
            create an account
          </Link>{' '}
          with {inv.email}, then come back to this page.
        </Notice>
      ) : me.user.email.toLowerCase() !== inv.email.toLowerCase() ? (
        <Notice tone="warning">
          You are signed in as {me.user.email}. Sign out and sign in with {inv.email} to accept.
        </Notice>
      ) : (
        <Button
          disabled={accept.isPending}
          onClick={() => accept.mutate(token, { onSuccess: (team) => onAccepted(team.id) })}
        >
          Join {inv.teamName}
        </Button>
      )}
      {accept.isError && <Notice tone="error">{accept.error.message}</Notice>}
    </div>
  );
}
