import type { AuditEvent } from '../../../../shared/schemas/audit';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useAuditLog } from '../api/get-audit-log';

function describe(e: AuditEvent): string {
  switch (e.action) {
    case 'team.created':
      return `created the team "${e.subject}"`;
    case 'team.renamed':
      return `renamed the team from "${e.detail.from}" to "${e.detail.to}"`;
    case 'member.signed_in':
      return 'signed in';
    case 'member.joined':
      return `joined as ${e.detail.role}`;
    case 'member.role_changed':
      return `changed ${e.subject} from ${e.detail.from} to ${e.detail.to}`;
    case 'member.removed':
      return `removed ${e.subject}`;
    case 'member.left':
      return 'left the team';
    case 'invitation.created':
      return `invited ${e.subject} as ${e.detail.role}`;
    case 'invitation.revoked':
      return `revoked the invitation of ${e.subject}`;
    case 'fit_test.recorded':
      return `recorded a ${e.detail.material} fit test for printer profile "${e.subject}"`;
    case 'fit_test.made_current':
      return `made an older ${e.detail.material} fit test current for printer profile "${e.subject}"`;
  }
}

/** Who did what, when, newest first (owners). */
export function AuditLog({ teamId }: { teamId: string }) {
  const { data, isPending, isError, error, fetchNextPage, hasNextPage, isFetchingNextPage } = useAuditLog(teamId, true);
  if (isPending) return <Notice>Loading the audit log…</Notice>;
  if (isError) return <Notice tone="error">{error.message}</Notice>;
  const events = data.pages.flatMap((p) => p.events);
  if (events.length === 0) return <p className="text-ink-soft">Nothing recorded yet.</p>;
  return (
    <div className="space-y-3">
      <ol className="divide-y divide-paper-deep">
        {events.map((e) => (
          <li key={e.id} className="py-2">
            <time dateTime={e.createdAt} className="mr-2 text-sm text-ink-soft">
              {new Date(e.createdAt).toLocaleString()}
            </time>
            <span className="font-medium">{e.actorName ?? e.actorEmail ?? 'Seamwright'}</span> {describe(e)}
          </li>
        ))}
      </ol>
      {hasNextPage && (
        <Button variant="quiet" onClick={() => fetchNextPage()} disabled={isFetchingNextPage}>
          Show older entries
        </Button>
      )}
    </div>
  );
}
