import { z } from 'zod';
import { plainText } from './plain-text';

/** Most rows one page of a team library list may hold. */
export const MAX_PAGE_SIZE = 100;
/** Rows per page when the query does not say. */
export const DEFAULT_PAGE_SIZE = 20;

// Query strings send "" for a cleared filter; treat it as absent rather than as a value to match.
const blankToUndefined = (value: unknown) => (value === '' ? undefined : value);

/**
 * An optional query-string filter: trimmed text, at most `max` characters, no control characters; ""
 * counts as not given.
 *
 * @param what - the filter in words, for the message
 * @param max - longest accepted value; default 100
 * @example
 * z.object({ tag: queryText('tag') }).parse({ tag: '' }); // { tag: undefined }
 */
export function queryText(what: string, max = 100) {
  return z.preprocess(
    blankToUndefined,
    plainText(
      z
        .string({ error: () => `${what} must be text` })
        .trim()
        .max(max, { error: () => `${what} must be at most ${max} characters` }),
      what,
    ).optional(),
  );
}

/** An optional query-string id filter (a uuid); "" counts as not given. */
export function queryId(what: string) {
  return z.preprocess(blankToUndefined, z.uuid({ error: () => `${what} must be an id` }).optional());
}

/**
 * The paging and ordering part of every library list query: `page` from 1, `pageSize` 1–100 (default 20),
 * `sort` one of `sortKeys` (default the first), `order` "asc" or "desc" (default "desc"), and free-text `q`.
 *
 * @param sortKeys - the columns this list sorts by, the default first
 * @example
 * listQueryFields(['updatedAt', 'name']).page.parse('2'); // 2
 */
export function listQueryFields<const K extends readonly [string, ...string[]]>(sortKeys: K) {
  return {
    q: queryText('search'),
    page: z.preprocess(
      blankToUndefined,
      z.coerce
        .number()
        .int()
        .min(1, { error: () => 'page starts at 1' })
        .default(1),
    ),
    pageSize: z.preprocess(
      blankToUndefined,
      z.coerce
        .number()
        .int()
        .min(1, { error: () => 'pageSize must be at least 1' })
        .max(MAX_PAGE_SIZE, { error: () => `pageSize must be at most ${MAX_PAGE_SIZE}` })
        .default(DEFAULT_PAGE_SIZE),
    ),
    sort: z.preprocess(
      blankToUndefined,
      z.enum(sortKeys, { error: () => `sort must be one of ${sortKeys.join(', ')}` }).default(sortKeys[0] as K[number]),
    ),
    order: z.preprocess(
      blankToUndefined,
      z.enum(['asc', 'desc'], { error: () => 'order must be "asc" or "desc"' }).default('desc'),
    ),
  };
}

/**
 * One page of a list reply: the rows, how many match in all, and which page this is.
 *
 * @param item - the schema of one row
 * @example
 * pageOf(presetSummarySchema).parse(await apiFetch('/teams/…/presets'));
 */
export function pageOf<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });
}

/** A page as services build it. */
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
