import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useMe } from '../../../lib/session';
import { useAcceptInvitation, useInvitationPreview } from '../api/accept-invitation';

interface Props {
  token: string;
  /**
   * Whether the signed-in account has confirmed its address (the server refuses to accept before): false keeps
   * the button disabled and says why (the page shows how to confirm); undefined, while that is being looked up,
   * keeps it disabled without a word.
   */
  verified: boolean | undefined;
  onAccepted: (teamId: string) => void;
}

/** Shows what an invitation offers and lets the invited, signed-in person accept it. */
export function AcceptInvitationPanel({ token, verified, onAccepted }: Props) {
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
        <div className="flex flex-wrap items-center gap-3">
          <Button
            disabled={accept.isPending || verified !== true}
            aria-describedby={verified === false ? 'accept-needs-verification' : undefined}
            onClick={() => accept.mutate(token, { onSuccess: (team) => onAccepted(team.id) })}
          >
            Join {inv.teamName}
          </Button>
          {verified === false && (
            <p id="accept-needs-verification" className="text-sm text-ink-soft">
              Confirm {inv.email} first with the link we e-mailed you, then open this invitation again.
            </p>
          )}
        </div>
      )}
      {accept.isError && <Notice tone="error">{accept.error.message}</Notice>}
    </div>
  );
}
