import { z } from 'zod';
import { plainText } from './plain-text';

/** Highest version number a saved thing can reach: versions are stored as a PostgreSQL integer (2^31 − 1). */
export const MAX_VERSION = 2_147_483_647;

/**
 * A version number a request names (the version an edit is based on, the preset version a kit came from):
 * a whole number from 1 to {@link MAX_VERSION}.
 *
 * @param what - the field in words, for the messages
 * @param missing - the message when the field is left out; default "<what> is required"
 * @example
 * versionNumberSchema('baseVersion').safeParse(2 ** 31); // issue "baseVersion must be at most 2147483647"
 */
export function versionNumberSchema(what: string, missing = `${what} is required`) {
  return z
    .number({ error: (iss) => (iss.input === undefined ? missing : `${what} must be a version number`) })
    .int({ error: () => `${what} must be a whole number` })
    .min(1, { error: () => `${what} starts at 1` })
    .max(MAX_VERSION, { error: () => `${what} must be at most ${MAX_VERSION}` });
}

/**
 * A library item's name (preset, printer profile, team material): trimmed, 1–80 characters without
 * control characters, unique in its team.
 */
export const libraryNameSchema = plainText(
  z
    .string({ error: () => 'Enter a name.' })
    .trim()
    .min(1, { error: () => 'Enter a name.' })
    .max(80, { error: () => 'Use at most 80 characters for the name.' }),
  'name',
);

/** Free notes or a description: at most 2000 characters, "" when none; line breaks and tabs allowed. */
export const notesSchema = plainText(
  z
    .string({ error: () => 'Notes must be text.' })
    .trim()
    .max(2000, { error: () => 'Use at most 2000 characters.' }),
  'notes',
  true,
);

/** One tag: lower case, 1–32 characters of letters, digits, spaces and dashes. */
export const tagSchema = z
  .string({ error: () => 'A tag must be text.' })
  .trim()
  .toLowerCase()
  .min(1, { error: () => 'A tag cannot be empty.' })
  .max(32, { error: () => 'A tag has at most 32 characters.' })
  .regex(/^[\p{L}\p{N} -]+$/u, { error: () => 'A tag may hold letters, digits, spaces and dashes only.' });

/** Up to 12 tags; repeats are dropped, order kept. */
export const tagsSchema = z
  .array(tagSchema, { error: () => 'tags must be a list of words' })
  .max(12, { error: () => 'Use at most 12 tags.' })
  .transform((tags) => [...new Set(tags)]);

/** Who did something, as a reply shows it; null once the account is gone. */
export const personSchema = z.object({ id: z.string(), name: z.string() }).nullable();
export type Person = z.infer<typeof personSchema>;
