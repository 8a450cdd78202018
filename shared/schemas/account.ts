import { z } from 'zod';
import { MAX_PASSWORD_LENGTH, passwordSchema } from './auth';
import { teamSummarySchema } from './team';

/**
 * `GET /api/me` reply (a fixed public contract): the signed-in user and every team they belong to.
 * @example { user: { id: '…', email: 'ada@quillmoss.example', name: 'Ada' }, teams: [{ id: '…', name: 'Ada', role: 'owner' }] }
 */
export const meSchema = z.object({
  user: z.object({ id: z.string(), email: z.string(), name: z.string() }),
  teams: z.array(teamSummarySchema),
});
export type Me = z.infer<typeof meSchema>;

/** `GET /api/account` reply: the account's own details, including whether the address is verified. */
export const accountSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  emailVerified: z.boolean(),
  createdAt: z.string(),
});
export type Account = z.infer<typeof accountSchema>;

/** `POST /api/account/password` body: the current password proves it is really the owner asking. */
export const changePasswordSchema = z.object({
  currentPassword: z
    .string({ error: () => 'Enter your current password.' })
    .min(1, { error: () => 'Enter your current password.' })
    .max(MAX_PASSWORD_LENGTH),
  newPassword: passwordSchema,
});
export type ChangePasswordInput = z.input<typeof changePasswordSchema>;
