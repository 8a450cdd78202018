import type { AppContext } from '../../app-context';
import type { Executor } from '../../db/executor';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import type { TeamDetail, TeamSummary } from '../../../shared/schemas/team';
import { recordAudit } from '../audit/audit.service';
import { requireTeamRole } from './team-access';
import * as repo from './teams.repository';

const toSummary = (t: repo.MemberTeam): TeamSummary => ({ id: t.id, name: t.name, role: t.role });
const toDetail = (t: repo.MemberTeam): TeamDetail => ({
  ...toSummary(t),
  personal: t.personal,
  createdAt: t.createdAt.toISOString(),
});

/** The name of a new account's personal team: "Ada Quill" → "Ada Quill's workshop" (within 80 characters). */
export const personalTeamName = (name: string) => `${name.slice(0, 67)}'s workshop`;

/** Creates a team with `user` as its first owner (inside the caller's transaction). */
export async function createTeamWithOwner(
  db: Executor,
  user: { id: string; email: string },
  name: string,
  personal: boolean,
): Promise<TeamSummary> {
  const team = await repo.insertTeam(db, { name, personal });
  await repo.insertMember(db, { teamId: team.id, userId: user.id, role: 'owner' });
  await recordAudit(db, team.id, user, 'team.created', name);
  return { id: team.id, name: team.name, role: 'owner' };
}

/** The user's teams with their role in each, personal team first. */
export async function listMyTeams(db: Executor, userId: string): Promise<TeamSummary[]> {
  return (await repo.listTeamsOfUser(db, userId)).map(toSummary);
}

/** A new shared team with the user as its owner; `name` is already validated. */
export function createTeam(ctx: AppContext, user: SessionUser, name: string): Promise<TeamSummary> {
  return ctx.db.transaction((tx) => createTeamWithOwner(tx, user, name, false));
}

export async function getTeam(ctx: AppContext, user: SessionUser, teamId: string): Promise<TeamDetail> {
  return toDetail(await requireTeamRole(ctx.db, teamId, user, 'viewer'));
}

/** Renames the team (owners); `name` is already validated. */
export function renameTeam(ctx: AppContext, user: SessionUser, teamId: string, name: string) {
  return ctx.db.transaction(async (tx): Promise<TeamDetail> => {
    const team = await requireTeamRole(tx, teamId, user, 'owner');
    await repo.renameTeam(tx, teamId, name);
    await recordAudit(tx, teamId, user, 'team.renamed', name, { from: team.name, to: name });
    return toDetail({ ...team, name });
  });
}

/** Deletes a team and everything it owns; owners only, and never the personal team. */
export async function deleteTeam(ctx: AppContext, user: SessionUser, teamId: string): Promise<void> {
  const team = await requireTeamRole(ctx.db, teamId, user, 'owner');
  if (team.personal) throw new AppError('CONFLICT', 'A personal team cannot be deleted.');
  await repo.deleteTeam(ctx.db, teamId);
}
