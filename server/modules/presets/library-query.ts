// Small pieces every team-library list and write shares: paging, search patterns, name clashes.
import { AppError } from '../../errors/app-error';

/** The row offset of a page (pages count from 1). */
export function offsetOf(page: number, pageSize: number): number {
  return (page - 1) * pageSize;
}

/** An ILIKE pattern that matches `text` anywhere, with the pattern characters in it taken literally. */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** True when the database refused a write because a unique index already holds the value. */
export function isUniqueViolation(err: unknown): boolean {
  // Drizzle wraps the driver's error; PostgreSQL's code for unique_violation is 23505.
  for (let e: unknown = err; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
    if ((e as { code?: unknown }).code === '23505') return true;
  }
  return false;
}

/** Runs a write and turns a name clash into a 409 that says which name is taken. */
export async function withUniqueName<T>(what: string, name: string, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (err) {
    if (isUniqueViolation(err))
      throw new AppError('CONFLICT', `This team already has a ${what} named "${name}": choose another name.`);
    throw err;
  }
}

/** A person as replies show them: null once the account is gone. */
export function personOf(id: string | null, name: string | null): { id: string; name: string } | null {
  return id && name !== null ? { id, name } : null;
}

/** `wanted`, or `wanted (2)`, `wanted (3)`… — the first that no name in `taken` (lower-cased) uses. */
export function freeName(wanted: string, taken: Set<string>): string {
  const base = wanted.slice(0, 72);
  if (!taken.has(wanted.toLowerCase())) return wanted;
  for (let n = 2; ; n += 1) {
    const candidate = `${base} (${n})`;
    if (!taken.has(candidate.toLowerCase())) return candidate;
  }
}
