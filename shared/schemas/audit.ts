import { z } from 'zod';

/** Every kind of audit entry, as stored and sent. */
export const auditActionSchema = z.enum([
  'team.created',
  'team.renamed',
  'member.signed_in',
  'member.joined',
  'member.role_changed',
  'member.removed',
  'member.left',
  'invitation.created',
  'invitation.revoked',
  'fit_test.recorded',
  'fit_test.made_current',
]);
export type AuditAction = z.infer<typeof auditActionSchema>;

/** One audit entry: who (null once the account is gone; `actorEmail` keeps the address), what, when. */
export const auditEventSchema = z.object({
  id: z.number(),
  action: auditActionSchema,
  actorName: z.string().nullable(),
  actorEmail: z.string().nullable(),
  subject: z.string(),
  detail: z.record(z.string(), z.string()),
  createdAt: z.string(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

/** `GET /api/teams/:teamId/audit` query: newest first, `before` is the last id of the previous page. */
export const auditQuerySchema = z.object({
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(100).default(50),
});

/** `GET /api/teams/:teamId/audit` reply. */
export const auditPageSchema = z.object({ events: z.array(auditEventSchema), nextBefore: z.number().nullable() });
export type AuditPage = z.infer<typeof auditPageSchema>;
