import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { GeometryError } from '../../shared/geometry/geometry-error';
import { AppError } from '../errors/app-error';
import { fromZod } from '../errors/from-zod';

// body-parser marks its own failures with a `type`; map them to the closed list of codes.
function fromBodyParser(err: { type?: string; limit?: number }): AppError | null {
  if (err.type === 'entity.too.large') {
    return new AppError('PAYLOAD_TOO_LARGE', `The request body is larger than the ${err.limit} bytes allowed.`);
  }
  if (err.type === 'entity.parse.failed') {
    return new AppError('BAD_REQUEST', 'The request body is not valid JSON.');
  }
  return null;
}

function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return fromZod(err);
  if (err instanceof GeometryError)
    return new AppError('GEOMETRY_IMPOSSIBLE', err.message, [{ path: err.code, message: err.message }]);
  if (typeof err === 'object' && err !== null) {
    const parsed = fromBodyParser(err as { type?: string; limit?: number });
    if (parsed) return parsed;
  }
  return new AppError('INTERNAL', 'Something went wrong on our side. Please try again.');
}

/** The one error middleware: every failure leaves in the shape {"error":{"code","message","issues"?}}. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const appError = toAppError(err);
  // A 500 is logged with its stack but never sends it to the client.
  if (appError.status >= 500) req.log?.error({ err }, 'request failed');
  if (appError.code === 'RATE_LIMITED' && !res.getHeader('Retry-After')) res.setHeader('Retry-After', '60');
  res.status(appError.status).json({
    error: {
      ...appError.extra,
      code: appError.code,
      message: appError.message,
      ...(appError.issues ? { issues: appError.issues } : {}),
    },
  });
};

/** Unknown /api routes answer 404 in the same shape instead of falling through to the client. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new AppError('NOT_FOUND', `There is no API route ${req.method} ${req.originalUrl}.`));
};
