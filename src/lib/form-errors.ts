import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';

/**
 * Puts a failed request's messages where people look: each issue beside its field when the form
 * has that field, everything else in the form's root error.
 */
export function showApiError<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: Path<T>[]) {
  if (!(error instanceof ApiError)) {
    setError('root', { message: 'Something went wrong. Please try again.' });
    return;
  }
  let placed = false;
  for (const issue of error.issues) {
    if ((fields as string[]).includes(issue.path)) {
      setError(issue.path as Path<T>, { message: issue.message });
      placed = true;
    }
  }
  if (!placed) setError('root', { message: error.message });
}
