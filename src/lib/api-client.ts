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

  constructor(status: number, code: string, message: string, issues: ApiIssue[] = []) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.issues = issues;
  }
}

interface ErrorBody {
  error?: { code?: string; message?: string; issues?: ApiIssue[] };
}

async function toApiError(response: Response): Promise<ApiError> {
  const body = (await response.json().catch(() => ({}))) as ErrorBody;
  const code = body.error?.code ?? 'INTERNAL';
  const message = body.error?.message ?? `The server answered ${response.status}.`;
  return new ApiError(response.status, code, message, body.error?.issues ?? []);
}

/** Fetches /api JSON; throws ApiError with the server's message on any failure. */
export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  const headers = new Headers(init.headers);
  if (init.body && !headers.has('Content-Type')) headers.set('Content-Type', 'application/json');
  let response: Response;
  try {
    response = await fetch(`/api${path}`, { ...init, headers, credentials: 'same-origin' });
  } catch {
    throw new ApiError(0, 'NETWORK', 'Seamwright could not reach its server. Check that it is running.');
  }
  if (!response.ok) throw await toApiError(response);
  return (await response.json()) as T;
}
