import type { z } from 'zod';

// C0 controls, DEL and C1 controls. PostgreSQL cannot store NUL in text or jsonb at all; the others are
// invisible, move the cursor or colour a terminal, and never belong in a name.
const CONTROL = /\p{Cc}/u;
// The same, but tab, line feed and carriage return are allowed: notes run over several lines.
const CONTROL_BUT_LINE_BREAKS = /(?![\t\n\r])\p{Cc}/u;
// Half of a UTF-16 surrogate pair on its own is not a character: it cannot be written as UTF-8, and
// PostgreSQL's jsonb refuses it.
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

/**
 * Refuses control characters (NUL, escape, DEL…) and broken Unicode (a lone surrogate) in a text field,
 * each with a message that names the field.
 *
 * @param schema - the string schema (its own trims and lengths are kept)
 * @param what - the field in words, for the message ("name", "notes")
 * @param lineBreaks - allow tab, line feed and carriage return (multi-line notes); default false
 * @returns the same schema with the two checks added
 * @example
 * plainText(z.string().trim().max(80), 'name').safeParse('a\u0000b'); // "name must not contain control characters"
 */
export function plainText<S extends z.ZodString>(schema: S, what: string, lineBreaks = false): S {
  const control = lineBreaks ? CONTROL_BUT_LINE_BREAKS : CONTROL;
  return schema
    .refine((v) => !control.test(v), {
      error: () => `${what} must not contain control characters${lineBreaks ? ' (line breaks and tabs are fine)' : ''}`,
    })
    .refine((v) => !LONE_SURROGATE.test(v), {
      error: () => `${what} holds a broken character (half of a surrogate pair): retype it`,
    }) as S;
}
