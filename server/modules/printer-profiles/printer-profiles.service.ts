import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import { parseWith } from '../../http/parse';
import type { Page } from '../../../shared/schemas/library-list';
import {
  printerProfileInputSchema,
  type ParsedPrinterProfileInput,
  type PrinterProfile,
  type PrinterProfilePatch,
} from '../../../shared/schemas/printer-profile';
import { requireTeamRole } from '../teams/team-access';
import { withUniqueName } from '../presets/library-query';
import * as repo from './printer-profiles.repository';

const NOT_FOUND = 'There is no such printer profile in this team.';

/** A page of the team's printer profiles; any member. */
export async function listPrinterProfiles(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  query: repo.ProfileListFilter,
): Promise<Page<PrinterProfile>> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const { items, total } = await repo.listProfiles(ctx.db, teamId, query);
  return { items, total, page: query.page, pageSize: query.pageSize };
}

/** One printer profile; any member. */
export async function getPrinterProfile(ctx: AppContext, user: SessionUser, teamId: string, id: string) {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const found = await repo.findProfile(ctx.db, teamId, id);
  if (!found) throw new AppError('NOT_FOUND', NOT_FOUND);
  return found;
}

/** Adds a printer profile; editors and owners. A name the team already uses answers 409. */
export async function createPrinterProfile(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  input: ParsedPrinterProfileInput,
) {
  await requireTeamRole(ctx.db, teamId, user, 'editor');
  const id = await withUniqueName('printer profile', input.name, () =>
    repo.insertProfile(ctx.db, teamId, user.id, input),
  );
  return (await repo.findProfile(ctx.db, teamId, id))!;
}

/**
 * Changes some fields of a profile; editors and owners. The merged profile is checked as a whole, so
 * switching to resin with a nozzle diameter still set is refused with the reason.
 */
export async function updatePrinterProfile(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  id: string,
  patch: PrinterProfilePatch,
) {
  await requireTeamRole(ctx.db, teamId, user, 'editor');
  const current = await repo.findProfile(ctx.db, teamId, id);
  if (!current) throw new AppError('NOT_FOUND', NOT_FOUND);
  const { id: _id, createdAt: _c, updatedAt: _u, updatedBy: _b, ...fields } = current;
  const merged = parseWith(printerProfileInputSchema, { ...fields, ...patch });
  await withUniqueName('printer profile', merged.name, () => repo.updateProfile(ctx.db, teamId, id, user.id, merged));
  return (await repo.findProfile(ctx.db, teamId, id))!;
}

/** Deletes a profile; owners only. Presets that used it keep their settings and lose the link. */
export async function deletePrinterProfile(ctx: AppContext, user: SessionUser, teamId: string, id: string) {
  await requireTeamRole(ctx.db, teamId, user, 'owner');
  if (!(await repo.deleteProfile(ctx.db, teamId, id))) throw new AppError('NOT_FOUND', NOT_FOUND);
}
