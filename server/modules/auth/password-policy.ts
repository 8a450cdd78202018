import { isCommonPassword } from '../../auth/password';
import { AppError } from '../../errors/app-error';

/**
 * Refuses passwords from the common-passwords list (length rules are in the shared schema). The
 * issue names the field, so forms show the message beside it.
 */
export function assertPasswordAllowed(password: string, path: string): void {
  if (isCommonPassword(password)) {
    const message = 'This password is one of the most common ones and easy to guess. Choose another.';
    throw new AppError('VALIDATION_FAILED', message, [{ path, message }]);
  }
}
