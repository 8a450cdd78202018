import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { GeometryError } from '../../shared/geometry/geometry-error';
import { AppError, type ErrorCode } from '../errors/app-error';
import { fromHttpError } from '../errors/from-http-error';
import { fromPostgres } from '../errors/from-postgres';
import { fromUpload } from '../errors/from-upload';
import { fromZod } from '../errors/from-zod';

function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return fromZod(err);
  if (err instanceof GeometryError)
    return new AppError('GEOMETRY_IMPOSSIBLE', err.message, [{ path: err.code, message: err.message }]);
  if (typeof err === 'object' && err !== null) {
    const mapped = fromHttpError(err) ?? fromUpload(err) ?? fromPostgres(err);
    if (mapped) return mapped;
  }
  return new AppError('INTERNAL', 'Something went wrong on our side. Please try again.');
}

// When to try again, in seconds, for answers that mean "not now" rather than "never".
const RETRY_AFTER: Partial<Record<ErrorCode, string>> = { RATE_LIMITED: '60', SERVICE_UNAVAILABLE: '5' };

/** The one error middleware: every failure leaves in the shape {"error":{"code","message","issues"?}}. */
export const errorHandler: ErrorRequestHandler = (err, req, res, next) => {
  const appError = toAppError(err);
  // A 500 is logged with its stack but never sends it to the client; a database outage is logged once per
  // request as a warning, without a stack, as it says nothing about the code.
  if (appError.code === 'SERVICE_UNAVAILABLE') req.log?.warn({ reason: appError.message }, 'request refused for now');
  else if (appError.status >= 500) req.log?.error({ err }, 'request failed');
  // A reply already under way (a zip being streamed) cannot change its status: Express cuts the connection.
  if (res.headersSent) return next(err);
  const retryAfter = RETRY_AFTER[appError.code];
  if (retryAfter && !res.getHeader('Retry-After')) res.setHeader('Retry-After', retryAfter);
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
