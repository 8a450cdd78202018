import type { z } from 'zod';
import { fromZod } from '../errors/from-zod';

/** Parses untrusted input with a shared schema; a failure becomes a 400 with a path per problem. */
export function parseWith<S extends z.ZodType>(schema: S, input: unknown, what?: string): z.output<S> {
  const result = schema.safeParse(input);
  if (!result.success) throw fromZod(result.error, what);
  return result.data;
}
