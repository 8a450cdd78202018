import { AppError } from './app-error';

type HttpError = { status?: unknown; statusCode?: unknown; type?: unknown; expose?: unknown; message?: unknown };
type Details = { limit?: unknown; charset?: unknown; encoding?: unknown };

const statusOf = (err: HttpError): number | null => {
  const status = typeof err.status === 'number' ? err.status : err.statusCode;
  return typeof status === 'number' ? status : null;
};

/**
 * Maps the 4xx failures of Express's own middleware to the closed list. body-parser marks its errors
 * with a `type` (too large, not JSON, unsupported charset or content encoding, broken compression); the
 * router answers a malformed %-escape in a path parameter with a 400 URIError. Other errors → null.
 */
export function fromHttpError(err: object): AppError | null {
  const e = err as HttpError & Details;
  const status = statusOf(e);
  if (status === null || status < 400 || status > 499) return null;
  switch (e.type) {
    case 'entity.too.large':
      return new AppError('PAYLOAD_TOO_LARGE', `The request body is larger than the ${String(e.limit)} bytes allowed.`);
    case 'entity.parse.failed':
      return new AppError('BAD_REQUEST', 'The request body is not valid JSON.');
    case 'charset.unsupported':
      return new AppError(
        'UNSUPPORTED_MEDIA_TYPE',
        `The request body's charset ${String(e.charset ?? '')} is not read here: send JSON in UTF-8.`,
      );
    case 'encoding.unsupported':
      return new AppError(
        'UNSUPPORTED_MEDIA_TYPE',
        `The request body's content encoding ${String(e.encoding ?? '')} is not read here: send it uncompressed, or as gzip, deflate or br.`,
      );
  }
  if (err instanceof URIError) {
    return new AppError('BAD_REQUEST', 'The request address holds a malformed %-escape.');
  }
  if (status === 413) return new AppError('PAYLOAD_TOO_LARGE', 'The request body is larger than allowed.');
  if (status === 415) return new AppError('UNSUPPORTED_MEDIA_TYPE', 'The request body is in a format not read here.');
  // e.g. a gzip body that does not inflate, or a body shorter than its Content-Length.
  const said = e.expose === true && typeof e.message === 'string' ? ` (${e.message})` : '';
  return new AppError('BAD_REQUEST', `The request body could not be read${said}.`);
}
