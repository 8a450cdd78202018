import { z } from 'zod';
import { linkTokenSchema } from './auth';
import { emailSchema } from './email';
import { roleSchema } from './team';

/** `POST /api/teams/:teamId/invitations` body: who to invite, and in which role. */
export const createInvitationSchema = z.object({ email: emailSchema, role: roleSchema });
export type CreateInvitationInput = z.input<typeof createInvitationSchema>;

/** A pending invitation as its team's owners see it. */
export const invitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string().nullable(),
  expiresAt: z.string(),
  createdAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** `POST /api/invitations/preview` and `/accept` body: the token from the invitation link. */
export const invitationTokenSchema = z.object({ token: linkTokenSchema });

/** What the accept page shows before the invitee decides. */
export const invitationPreviewSchema = z.object({
  teamName: z.string(),
  role: roleSchema,
  email: z.string(),
  invitedBy: z.string().nullable(),
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;
