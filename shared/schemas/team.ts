import { z } from 'zod';
import { plainText } from './plain-text';

/** Team roles, strongest first: owner (everything), editor (create and change), viewer (read, download). */
export const roleSchema = z.enum(['owner', 'editor', 'viewer'], { error: () => 'Pick owner, editor or viewer.' });
export type Role = z.infer<typeof roleSchema>;

/** How strong each role is; a route that needs `editor` also admits `owner`. */
export const roleRank: Record<Role, number> = { owner: 3, editor: 2, viewer: 1 };

/** A team name: trimmed, 1 to 80 characters without control characters, stored and shown as written. */
export const teamNameSchema = plainText(
  z
    .string({ error: () => 'Enter a team name.' })
    .trim()
    .min(1, { error: () => 'Enter a team name.' })
    .max(80, { error: () => 'Use at most 80 characters.' }),
  'team name',
);

/** One of the signed-in user's teams, with their role in it. */
export const teamSummarySchema = z.object({ id: z.string(), name: z.string(), role: roleSchema });
export type TeamSummary = z.infer<typeof teamSummarySchema>;

/** `GET /api/teams/:teamId` reply. */
export const teamDetailSchema = teamSummarySchema.extend({ personal: z.boolean(), createdAt: z.string() });
export type TeamDetail = z.infer<typeof teamDetailSchema>;

/** `POST /api/teams` and `PATCH /api/teams/:teamId` body. */
export const teamInputSchema = z.object({ name: teamNameSchema });
export type TeamInput = z.input<typeof teamInputSchema>;

/** A member as listed on the team page. */
export const memberSchema = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

/** `PATCH /api/teams/:teamId/members/:userId` body. */
export const changeRoleSchema = z.object({ role: roleSchema });
export type ChangeRoleInput = z.input<typeof changeRoleSchema>;
