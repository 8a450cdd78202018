import type { AppContext } from '../../app-context';
import type { Executor } from '../../db/executor';
import type { SessionUser } from '../../auth/sessions';
import type { AuditAction, AuditPage } from '../../../shared/schemas/audit';
import { requireTeamRole } from '../teams/team-access';
import { insertAuditEvents, listAuditEvents } from './audit.repository';

/** Who did it: the signed-in user, or null for the system. */
export type Actor = Pick<SessionUser, 'id' | 'email'> | null;

/** Appends one entry to a team's audit log (inside the caller's transaction when given one). */
export function recordAudit(
  db: Executor,
  teamId: string,
  actor: Actor,
  action: AuditAction,
  subject = '',
  detail: Record<string, string> = {},
): Promise<void> {
  return insertAuditEvents(db, [
    { teamId, actorId: actor?.id ?? null, actorEmail: actor?.email ?? null, action, subject, detail },
  ]);
}

/** Records the same event in several teams at once (a sign-in shows in every team of the user). */
export function recordAuditInTeams(db: Executor, teamIds: string[], actor: Actor, action: AuditAction) {
  return insertAuditEvents(
    db,
    teamIds.map((teamId) => ({ teamId, actorId: actor?.id ?? null, actorEmail: actor?.email ?? null, action })),
  );
}

/** A page of the team's audit log; owners only. */
export async function readAuditLog(
  ctx: AppContext,
  user: SessionUser,
  teamId: string,
  query: { before?: number; limit: number },
): Promise<AuditPage> {
  await requireTeamRole(ctx.db, teamId, user, 'owner');
  const rows = await listAuditEvents(ctx.db, teamId, query.before, query.limit);
  const events = rows.map((r) => ({
    ...r,
    action: r.action as AuditAction,
    createdAt: r.createdAt.toISOString(),
  }));
  const last = events.at(-1);
  return { events, nextBefore: events.length === query.limit && last ? last.id : null };
}
