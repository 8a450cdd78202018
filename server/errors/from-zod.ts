import type { ZodError } from 'zod';
import { AppError, type ErrorIssue } from './app-error';

/** Turns a zod failure into a 400 with one issue per problem, each with its dotted path. */
export function fromZod(error: ZodError, what = 'request body'): AppError {
  const issues: ErrorIssue[] = error.issues.map((issue) => ({
    path: issue.path.map(String).join('.'),
    message: issue.message,
  }));
  const first = issues[0];
  const summary = first ? `${first.path ? `${first.path}: ` : ''}${first.message}` : 'invalid input';
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
  return new AppError('VALIDATION_FAILED', `The ${what} is not valid: ${summary}${more}.`, issues);
}
