/** One problem with one field, as the API reports it. */
export interface ApiIssue {
  path: string;
  message: string;
}

/** Every failed API call becomes this: the server's code and plain-words message, typed. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: ApiIssue[];
  /** The whole error object as sent, for replies that carry more (the current version beside a 409). */
  readonly details: Record<string, unknown>;

  constructor(
    status: number,
    code: string,
    message: string,
    issues: ApiIssue[] = [],
    details: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.issues = issues;
    this.details = details;
  }
}

interface ErrorBody {
  error?: { code?: string; message?: string; issues?: ApiIssue[]; [more: string]: unknown };
}

async function toApiError(response: Response): Promise<ApiError> {
  const body = (await response.json().catch(() => ({}))) as ErrorBody;
  const code = body.error?.code ?? 'INTERNAL';
  const message = body.error?.message ?? `The server answered ${response.status}.`;
  return new ApiError(response.status, code, message, body.error?.issues ?? [], body.error ?? {});
}

/** Fetches /api JSON; throws ApiError with the server's message on any failure. */
export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  const headers = new Headers(init.headers);
  // A FormData body sets its own multipart type and boundary.
  if (init.body && !(init.body instanceof FormData) && !headers.has('Content-Type'))
    headers.set('Content-Type', 'application/json');
  let response: Response;
  try {
    response = await fetch(`/api${path}`, { ...init, headers, credentials: 'same-origin' });
  } catch {
    throw new ApiError(0, 'NETWORK', 'Seamwright could not reach its server. Check that it is running.');
  }
  if (!response.ok) throw await toApiError(response);
  // 204 No Content (a delete) has no body to read.
  if (response.status === 204) return undefined as T;
  return (await response.json()) as T;
}

/** A file the API answered: its bytes, the name it offers, and the reply headers. */
export interface ApiFile {
  blob: Blob;
  fileName: string;
  headers: Headers;
}

/** Fetches an /api file download (a zip, a JSON export); throws ApiError like {@link apiFetch}. */
export async function apiFile(path: string, init: RequestInit = {}): Promise<ApiFile> {
  const headers = new Headers(init.headers);
  if (init.body && !headers.has('Content-Type')) headers.set('Content-Type', 'application/json');
  let response: Response;
  try {
    response = await fetch(`/api${path}`, { ...init, headers, credentials: 'same-origin' });
  } catch {
    throw new ApiError(0, 'NETWORK', 'Seamwright could not reach its server. Check that it is running.');
  }
  if (!response.ok) throw await toApiError(response);
  const disposition = response.headers.get('Content-Disposition') ?? '';
  const fileName = /filename="?([^";]+)"?/.exec(disposition)?.[1] ?? 'download';
  return { blob: await response.blob(), fileName, headers: response.headers };
}

/** Hands a fetched file to the browser as a download. */
export function saveFile({ blob, fileName }: Pick<ApiFile, 'blob' | 'fileName'>): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  // Revoked on the next tick: the click has started the download by then.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

/**
 * A list query as a URL query string, leaving out what is not set (undefined or empty), so a list's filters
 * can be passed as they are.
 *
 * @example
 * toQueryString({ q: 'helmet', tag: '', page: 2 }); // "q=helmet&page=2"
 */
export function toQueryString(query: object): string {
  return new URLSearchParams(
    Object.entries(query)
      .filter(([, v]) => v !== undefined && v !== '')
      .map(([k, v]) => [k, String(v)]),
  ).toString();
}
