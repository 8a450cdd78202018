import type { AppContext } from '../../app-context';
import type { SessionUser } from '../../auth/sessions';
import { AppError } from '../../errors/app-error';
import type { Page } from '../../../shared/schemas/library-list';
import type { KitHistoryEntry, KitHistoryItem, kitHistoryQuerySchema } from '../../../shared/schemas/kit-history';
import type { z } from 'zod';
import { requireTeamRole } from '../teams/team-access';
import * as repo from './kit-history.repository';

const NOT_FOUND = 'There is no such kit in this team’s history.';

/** A page of the team's kit history; any member. */
export async function listKitHistory(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  query: z.output<typeof kitHistoryQuerySchema>,
): Promise<Page<KitHistoryItem>> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const { items, total } = await repo.listKitDownloads(ctx.db, teamId, query);
  return { items, total, page: query.page, pageSize: query.pageSize };
}

/** One recorded kit with its full request and STL hashes; any member. */
export async function getKitEntry(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  id: string,
): Promise<KitHistoryEntry> {
  await requireTeamRole(ctx.db, teamId, user, 'viewer');
  const row = await repo.findKitDownload(ctx.db, teamId, id);
  if (!row) throw new AppError('NOT_FOUND', NOT_FOUND);
  const { request, files, ...item } = row;
  return { ...repo.toItem(item), request, files };
}
