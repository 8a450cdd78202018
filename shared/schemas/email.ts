import { z } from 'zod';

/** Longest address SMTP can carry: a 256-octet path minus its angle brackets (RFC 5321 §4.5.3.1.3). */
export const MAX_EMAIL_LENGTH = 254;
/** Longest local part, before the @ (RFC 5321 §4.5.3.1.1). */
export const MAX_EMAIL_LOCAL_LENGTH = 64;

// Raw input above this is refused before any work is spent on it.
const MAX_RAW_LENGTH = 1024;
// Invisible format characters (zero-width space, joiner, BOM…) make two addresses look identical.
const INVISIBLE = /\p{Cf}/gu;
// Letters, digits and hyphens per label; non-ASCII domains must arrive in their xn-- form so
// look-alike letters from other scripts cannot pass as a familiar domain.
const DOMAIN = /^(?=.{1,253}$)(?:[a-z0-9](?:[a-z0-9-]{0,61}[a-z0-9])?\.)+[a-z0-9](?:[a-z0-9-]{0,61}[a-z0-9])?$/;
// Anything visible except @, spaces, angle brackets, quotes, control characters and lone surrogates
// (half a character, which no mail server can carry).
const LOCAL = /^[^\s@<>"()[\]\\,;:\p{Cc}\p{Cs}]+$/u;

/**
 * Normalises an e-mail address the same way on both sides: NFKC (full-width and other compatibility
 * look-alikes become their plain letters), invisible characters removed, surrounding space trimmed,
 * the domain lower-cased. The local part keeps its case, as RFC 5321 allows it to matter.
 * @param raw the address as typed
 * @returns the normalised address
 * @example normaliseEmail(' Ada@QUILLMOSS.example ') // 'Ada@quillmoss.example'
 */
export function normaliseEmail(raw: string): string {
  const cleaned = raw.normalize('NFKC').replace(INVISIBLE, '').trim();
  const at = cleaned.lastIndexOf('@');
  if (at < 0) return cleaned;
  return `${cleaned.slice(0, at)}@${cleaned.slice(at + 1).toLowerCase()}`;
}

/**
 * An e-mail address field: normalised with {@link normaliseEmail}, then checked for length and shape.
 * @example emailSchema.parse('ａｄａ@Quillmoss.example') // 'ada@quillmoss.example'
 */
export const emailSchema = z
  .string({ error: () => 'Enter your e-mail address.' })
  .max(MAX_RAW_LENGTH, { error: () => `An e-mail address has at most ${MAX_EMAIL_LENGTH} characters.` })
  .transform(normaliseEmail)
  .pipe(
    z
      .string()
      .min(1, { error: () => 'Enter your e-mail address.' })
      .max(MAX_EMAIL_LENGTH, { error: () => `An e-mail address has at most ${MAX_EMAIL_LENGTH} characters.` })
      .refine((v) => /^[^@]+@[^@]+$/.test(v), { error: () => 'An e-mail address looks like name@example.com.' })
      .refine((v) => isValidAddress(v), {
        error: () => 'This e-mail address is not valid. Write the domain in plain letters (or its xn-- form).',
      }),
  );

function isValidAddress(value: string): boolean {
  const at = value.lastIndexOf('@');
  const local = value.slice(0, at);
  const domain = value.slice(at + 1);
  return local.length <= MAX_EMAIL_LOCAL_LENGTH && LOCAL.test(local) && DOMAIN.test(domain);
}
