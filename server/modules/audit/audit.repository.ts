import { and, desc, eq, lt } from 'drizzle-orm';
import type { Executor } from '../../db/executor';
import { auditEvents, users } from '../../db/schema';
import type { AuditAction } from '../../../shared/schemas/audit';

export interface NewAuditEvent {
  teamId: string;
  actorId: string | null;
  actorEmail: string | null;
  action: AuditAction;
  subject?: string;
  detail?: Record<string, string>;
}

export async function insertAuditEvents(db: Executor, events: NewAuditEvent[]): Promise<void> {
  if (events.length > 0) await db.insert(auditEvents).values(events);
}

/** One page of a team's log, newest first; `before` is an event id from the previous page. */
export function listAuditEvents(db: Executor, teamId: string, before: number | undefined, limit: number) {
  return db
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      actorName: users.name,
      actorEmail: auditEvents.actorEmail,
      subject: auditEvents.subject,
      detail: auditEvents.detail,
      createdAt: auditEvents.createdAt,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(and(eq(auditEvents.teamId, teamId), before === undefined ? undefined : lt(auditEvents.id, before)))
    .orderBy(desc(auditEvents.id))
    .limit(limit);
}
