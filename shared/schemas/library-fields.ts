import { z } from 'zod';

/**
 * A library item's name (preset, printer profile, team material): trimmed, 1–80 characters, unique in
 * its team.
 */
export const libraryNameSchema = z
  .string({ error: () => 'Enter a name.' })
  .trim()
  .min(1, { error: () => 'Enter a name.' })
  .max(80, { error: () => 'Use at most 80 characters for the name.' });

/** Free notes or a description: at most 2000 characters, "" when none. */
export const notesSchema = z
  .string({ error: () => 'Notes must be text.' })
  .trim()
  .max(2000, { error: () => 'Use at most 2000 characters.' });

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
