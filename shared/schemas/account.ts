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

/** The reply of `GET /api/session`: the same as `GET /api/me` when signed in, `{ "me": null }` otherwise. */
export const sessionReplySchema = z.object({ me: meSchema.nullable() });

/**
 * Units a person sees and types lengths in: millimetres or inches. Display and entry only — every
 * stored and sent length stays in millimetres.
 * @example unitsSchema.parse('in'); // 'in'
 */
export const unitsSchema = z.enum(['mm', 'in'], { error: () => 'units must be "mm" or "in"' });
export type Units = z.infer<typeof unitsSchema>;

/** `GET /api/account` reply: the account's own details, including whether the address is verified. */
export const accountSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  emailVerified: z.boolean(),
  createdAt: z.string(),
  units: unitsSchema,
});
export type Account = z.infer<typeof accountSchema>;

/**
 * `PATCH /api/account` body: the account's preferences (only the units so far). The reply is the
 * whole account, as `GET /api/account` gives it.
 * @example { units: 'in' }
 */
export const updateAccountSchema = z.object({ units: unitsSchema });
export type UpdateAccountInput = z.input<typeof updateAccountSchema>;

/** `POST /api/account/password` body: the current password proves it is really the owner asking. */
export const changePasswordSchema = z.object({
  currentPassword: z
    .string({ error: () => 'Enter your current password.' })
    .min(1, { error: () => 'Enter your current password.' })
    .max(MAX_PASSWORD_LENGTH),
  newPassword: passwordSchema,
});
export type ChangePasswordInput = z.input<typeof changePasswordSchema>;
