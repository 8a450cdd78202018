import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useInvitations } from '../api/get-invitations';
import { useRevokeInvitation } from '../api/revoke-invitation';

/** Pending invitations with a way to revoke each (owners). */
export function InvitationsList({ teamId }: { teamId: string }) {
  const { data, isPending, isError, error } = useInvitations(teamId, true);
  const revoke = useRevokeInvitation(teamId);
  if (isPending) return <Notice>Loading invitations…</Notice>;
  if (isError) return <Notice tone="error">{error.message}</Notice>;
  if (data.length === 0) return <p className="text-ink-soft">No pending invitations.</p>;
  return (
    <div className="space-y-3">
      {revoke.isError && <Notice tone="error">{revoke.error.message}</Notice>}
      <ul className="divide-y divide-paper-deep">
        {data.map((inv) => (
          <li key={inv.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <span>
              <span className="font-medium break-all">{inv.email}</span> as {inv.role}
              <span className="block text-sm text-ink-soft">
                Invited by {inv.invitedBy ?? 'a former member'}; expires {new Date(inv.expiresAt).toLocaleDateString()}
              </span>
            </span>
            <Button
              variant="quiet"
              aria-label={`Revoke the invitation of ${inv.email}`}
              disabled={revoke.isPending}
              onClick={() => revoke.mutate(inv.id)}
            >
              Revoke
            </Button>
          </li>
        ))}
      </ul>
    </div>
  );
}
