import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import type { Member, Role } from '../../../shared/schemas/team';
import { recordAudit } from '../audit/audit.service';
import { requireTeamRole } from './team-access';
import { lockTeam } from './teams.repository';
import * as repo from './members.repository';

const toMember = (m: repo.MemberRecord): Member => ({ ...m, joinedAt: m.joinedAt.toISOString() });
const LAST_OWNER = 'A team always keeps at least one owner: make someone else an owner first.';

/** Everyone in the team; any member may read it. */
export async function listTeamMembers(ctx: AppContext, user: SessionUser, teamId: string): Promise<Member[]> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  return (await repo.listMembers(ctx.db, teamId)).map(toMember);
}

/** Gives a member another role (owners only); the last owner cannot step down. */
export function changeMemberRole(ctx: AppContext, actor: SessionUser, teamId: string, userId: string, role: Role) {
  return ctx.db.transaction(async (tx): Promise<Member> => {
    await requireTeamRole(tx, teamId, actor, 'owner');
    // The lock serialises role changes in this team, so two owners cannot demote each other at once.
    await lockTeam(tx, teamId);
    const target = await repo.findMember(tx, teamId, userId);
    if (!target) throw new AppError('NOT_FOUND', 'This person is not a member of the team.');
    if (target.role === role) return toMember(target);
    if (target.role === 'owner' && (await repo.countOwners(tx, teamId)) <= 1)
      throw new AppError('CONFLICT', LAST_OWNER);
    await repo.updateMemberRole(tx, teamId, userId, role);
    await recordAudit(tx, teamId, actor, 'member.role_changed', target.email, { from: target.role, to: role });
    return toMember({ ...target, role });
  });
}

/** Removes a member (owners), or lets a member leave; the last owner can do neither. */
export function removeMember(ctx: AppContext, actor: SessionUser, teamId: string, userId: string) {
  const leaving = actor.id === userId;
  return ctx.db.transaction(async (tx): Promise<void> => {
    await requireTeamRole(tx, teamId, actor, leaving ? 'viewer' : 'owner');
    await lockTeam(tx, teamId);
    const target = await repo.findMember(tx, teamId, userId);
    if (!target) throw new AppError('NOT_FOUND', 'This person is not a member of the team.');
    if (target.role === 'owner' && (await repo.countOwners(tx, teamId)) <= 1)
      throw new AppError('CONFLICT', LAST_OWNER);
    await repo.deleteMember(tx, teamId, userId);
    await recordAudit(tx, teamId, actor, leaving ? 'member.left' : 'member.removed', target.email, {
      role: target.role,
    });
  });
}
