import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { ScrollX } from '../../../components/ui/scroll-x';
import type { Role } from '../../../../shared/schemas/team';
import { useChangeRole } from '../api/change-role';
import { useMembers } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { RoleSelect } from './role-select';

interface Props {
  teamId: string;
  myUserId: string;
  isOwner: boolean;
}

/** The team's members; owners change roles and remove people, anyone can leave. */
export function MembersTable({ teamId, myUserId, isOwner }: Props) {
  const { data, isPending, isError, error } = useMembers(teamId);
  const changeRole = useChangeRole(teamId);
  const remove = useRemoveMember(teamId);
  if (isPending) return <Notice>Loading members…</Notice>;
  if (isError) return <Notice tone="error">{error.message}</Notice>;
  const problem = changeRole.error ?? remove.error;
  return (
    <div className="space-y-3">
      {problem && <Notice tone="error">{problem.message}</Notice>}
      <ScrollX label="Team members">
        <table className="w-full text-left">
          <caption className="sr-only">Team members</caption>
          <thead className="border-b border-ink-faint text-sm text-ink-soft">
            <tr>
              <th scope="col" className="py-2">
                Name
              </th>
              <th scope="col" className="hidden sm:table-cell">
                E-mail
              </th>
              <th scope="col">Role</th>
              <th scope="col">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {data.map((m) => (
              <tr key={m.userId} className="border-b border-paper-deep align-middle">
                <td className="py-2 pr-3">
                  <span className="font-medium">{m.name}</span>
                  {/* On a phone the address goes under the name: a column of its own would be one letter wide. */}
                  <span className="block text-sm break-all text-ink-soft sm:hidden">{m.email}</span>
                </td>
                <td className="hidden pr-3 break-all sm:table-cell">{m.email}</td>
                <td className="pr-3">
                  {isOwner ? (
                    <RoleSelect
                      aria-label={`Role of ${m.name}`}
                      value={m.role}
                      disabled={changeRole.isPending}
                      onChange={(e) => changeRole.mutate({ teamId, userId: m.userId, role: e.target.value as Role })}
                    />
                  ) : (
                    m.role
                  )}
                </td>
                <td className="py-2 text-right">
                  {(isOwner || m.userId === myUserId) && (
                    <Button
                      variant="danger"
                      disabled={remove.isPending}
                      onClick={() => {
                        const question = m.userId === myUserId ? 'Leave this team?' : `Remove ${m.name} from the team?`;
                        if (window.confirm(question)) remove.mutate({ teamId, userId: m.userId });
                      }}
                    >
                      {m.userId === myUserId ? 'Leave' : 'Remove'}
                    </Button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollX>
    </div>
  );
}
