/** Every error code the API answers with, and the HTTP status each one carries. */
export const errorStatus = {
  VALIDATION_FAILED: 400,
  BAD_REQUEST: 400,
  UNAUTHENTICATED: 401,
  FORBIDDEN: 403,
  // The account must confirm its e-mail address first (inviting, accepting invitations).
  EMAIL_UNVERIFIED: 403,
  NOT_FOUND: 404,
  CONFLICT: 409,
  PAYLOAD_TOO_LARGE: 413,
  // A body in a charset or content encoding the server does not read (JSON is read as UTF-8 only).
  UNSUPPORTED_MEDIA_TYPE: 415,
  GEOMETRY_IMPOSSIBLE: 422,
  // Well-formed input that cannot be used as it stands, e.g. a fit test whose answers contradict each other.
  UNPROCESSABLE: 422,
  RATE_LIMITED: 429,
  INTERNAL: 500,
  SERVICE_UNAVAILABLE: 503,
} as const;
export type ErrorCode = keyof typeof errorStatus;

export interface ErrorIssue {
  path: string;
  message: string;
}

/** The one error type services throw; the error middleware turns it into the wire format. */
export class AppError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly issues?: ErrorIssue[];
  /** More fields for the error object, e.g. the current version beside a 409 of a stale save. */
  readonly extra?: Record<string, unknown>;

  constructor(code: ErrorCode, message: string, issues?: ErrorIssue[], extra?: Record<string, unknown>) {
    super(message);
    this.name = 'AppError';
    this.code = code;
    this.status = errorStatus[code];
    this.issues = issues;
    this.extra = extra;
  }
}
