import { z } from 'zod';
import { emailSchema } from './email';
import { plainText } from './plain-text';

/** Shortest password accepted (common practice: NIST SP 800-63B §5.1.1.2 asks for at least 8; we ask 10). */
export const MIN_PASSWORD_LENGTH = 10;
/** Longest password accepted; long enough for any passphrase, short enough to hash cheaply. */
export const MAX_PASSWORD_LENGTH = 256;

/**
 * A new password: 10 to 256 characters, kept exactly as typed (no trimming). The server also refuses
 * the most common passwords; that list is too large to ship to the browser.
 * @example passwordSchema.parse('bench-vise-walnut')
 */
export const passwordSchema = z
  .string({ error: () => 'Enter a password.' })
  .min(MIN_PASSWORD_LENGTH, { error: () => `Use at least ${MIN_PASSWORD_LENGTH} characters.` })
  .max(MAX_PASSWORD_LENGTH, { error: () => `Use at most ${MAX_PASSWORD_LENGTH} characters.` });

/** A display name: trimmed, 1 to 100 characters without control characters, stored and shown as written. */
export const displayNameSchema = plainText(
  z
    .string({ error: () => 'Enter your name.' })
    .trim()
    .min(1, { error: () => 'Enter your name.' })
    .max(100, { error: () => 'Use at most 100 characters.' }),
  'name',
);

/**
 * `POST /api/auth/sign-up` body.
 * @example { email: 'ada@quillmoss.example', password: 'bench-vise-walnut', name: 'Ada' }
 */
export const signUpSchema = z.object({ email: emailSchema, password: passwordSchema, name: displayNameSchema });
export type SignUpInput = z.input<typeof signUpSchema>;

/**
 * `POST /api/auth/sign-in` body. The password is only checked for presence and a sane length here:
 * old accounts keep working if the rules for new passwords change.
 */
export const signInSchema = z.object({
  email: emailSchema,
  password: z
    .string({ error: () => 'Enter your password.' })
    .min(1, { error: () => 'Enter your password.' })
    .max(MAX_PASSWORD_LENGTH, { error: () => `A password has at most ${MAX_PASSWORD_LENGTH} characters.` }),
});
export type SignInInput = z.input<typeof signInSchema>;

/** A token from a mailed link (verification, reset, invitation): URL-safe base64, 43 characters for 256 bits. */
export const linkTokenSchema = z
  .string({ error: () => 'The link is incomplete.' })
  .regex(/^[A-Za-z0-9_-]{20,128}$/, { error: () => 'The link is incomplete or has been changed.' });

/** `POST /api/auth/verify-email` body. */
export const verifyEmailSchema = z.object({ token: linkTokenSchema });

/** `POST /api/auth/password-reset/request` body. */
export const resetRequestSchema = z.object({ email: emailSchema });
export type ResetRequestInput = z.input<typeof resetRequestSchema>;

/** `POST /api/auth/password-reset/confirm` body. */
export const resetConfirmSchema = z.object({ token: linkTokenSchema, password: passwordSchema });
export type ResetConfirmInput = z.input<typeof resetConfirmSchema>;
