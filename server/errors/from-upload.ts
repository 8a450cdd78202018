import multer from 'multer';
import { AppError } from './app-error';

// What the multipart parser under multer (busboy) throws for a body that is not a well-formed form.
const BROKEN_FORM =
  /^(Unexpected end of (form|file)|Malformed (part header|urlencoded form|content type)|Multipart: Boundary not found)$/;

/**
 * Maps a failed multipart upload to the closed list: too large → 413, any other multer limit or a body
 * that is not a well-formed multipart form (cut short, no boundary, broken part headers) → 400.
 * Other errors → null.
 */
export function fromUpload(err: object): AppError | null {
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new AppError('PAYLOAD_TOO_LARGE', 'The uploaded file is too large.');
    return new AppError('BAD_REQUEST', `The upload was refused (${err.message}).`);
  }
  if (err instanceof Error && BROKEN_FORM.test(err.message)) {
    return new AppError(
      'BAD_REQUEST',
      `The upload is not a well-formed multipart form (${err.message}): send one file in a field named "file".`,
    );
  }
  return null;
}
