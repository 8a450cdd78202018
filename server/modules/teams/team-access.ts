import { AppError } from '../../errors/app-error';
import type { Executor } from '../../db/executor';
import { roleRank, type Role } from '../../../shared/schemas/team';
import { findTeamOfMember, type MemberTeam } from './teams.repository';

const roleWords: Record<Role, string> = {
  owner: 'owners',
  editor: 'editors and owners',
  viewer: 'members',
};

/**
 * The team as the user sees it, when their role is at least `minimum`. A team the user does not
 * belong to answers 404 exactly like a team that does not exist, so ids leak nothing; a member
 * with too weak a role gets 403. Every team-scoped service starts here.
 */
export async function requireTeamRole(
  db: Executor,
  teamId: string,
  user: { id: string },
  minimum: Role,
): Promise<MemberTeam> {
  const team = await findTeamOfMember(db, teamId, user.id);
  if (!team) throw new AppError('NOT_FOUND', 'There is no such team, or you are not one of its members.');
  if (roleRank[team.role] < roleRank[minimum]) {
    throw new AppError('FORBIDDEN', `Only ${roleWords[minimum]} of this team can do this.`);
  }
  return team;
}
