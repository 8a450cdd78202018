import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import { parseWith } from '../../http/parse';
import type { Page } from '../../../shared/schemas/library-list';
import {
  teamMaterialInputSchema,
  type BuiltInMaterial,
  type ParsedTeamMaterialInput,
  type TeamMaterial,
  type TeamMaterialPatch,
} from '../../../shared/schemas/material';
import { requireTeamRole } from '../teams/team-access';
import { withUniqueName } from '../presets/library-query';
import { builtInMaterials } from './material-catalogue';
import * as repo from './materials.repository';

const NOT_FOUND = 'There is no such material in this team.';

/** The built-in catalogue (read-only, with sources); any member. */
export async function readCatalogue(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
): Promise<{ items: BuiltInMaterial[] }> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  return { items: builtInMaterials() };
}

/** A page of the team's own materials; any member. */
export async function listTeamMaterials(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  query: repo.MaterialListFilter,
): Promise<Page<TeamMaterial>> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const { items, total } = await repo.listMaterials(ctx.db, teamId, query);
  return { items, total, page: query.page, pageSize: query.pageSize };
}

/** Adds a team material; editors and owners. */
export async function createTeamMaterial(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  input: ParsedTeamMaterialInput,
) {
  await requireTeamRole(ctx.db, teamId, user, 'editor');
  const id = await withUniqueName('material', input.name, () => repo.insertMaterial(ctx.db, teamId, user.id, input));
  return (await repo.findMaterial(ctx.db, teamId, id))!;
}

/** Changes some fields of a team material; editors and owners. */
export async function updateTeamMaterial(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  id: string,
  patch: TeamMaterialPatch,
) {
  await requireTeamRole(ctx.db, teamId, user, 'editor');
  const current = await repo.findMaterial(ctx.db, teamId, id);
  if (!current) throw new AppError('NOT_FOUND', NOT_FOUND);
  const { name, baseMaterial, shrinkagePercent, clearanceAdjustments, notes } = current;
  const merged = parseWith(teamMaterialInputSchema, {
    name,
    baseMaterial,
    shrinkagePercent,
    notes,
    ...patch,
    // Fit classes the patch does not name keep their adjustment.
    clearanceAdjustments: { ...clearanceAdjustments, ...patch.clearanceAdjustments },
  });
  await withUniqueName('material', merged.name, () => repo.updateMaterial(ctx.db, teamId, id, user.id, merged));
  return (await repo.findMaterial(ctx.db, teamId, id))!;
}

/** Deletes a team material; owners only. */
export async function deleteTeamMaterial(ctx: AppContext, user: SessionUser, teamId: string, id: string) {
  await requireTeamRole(ctx.db, teamId, user, 'owner');
  if (!(await repo.deleteMaterial(ctx.db, teamId, id))) throw new AppError('NOT_FOUND', NOT_FOUND);
}
