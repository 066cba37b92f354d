/** The one way the client talks to the API: JSON in, JSON out, errors thrown as ApiError the UI can show. */

export interface FieldIssue {
  path: string;
  message: string;
}

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: FieldIssue[];
  readonly retryAfterSeconds: number | undefined;

  constructor(status: number, code: string, message: string, issues: FieldIssue[] = [], retryAfter?: number) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.issues = issues;
    this.retryAfterSeconds = retryAfter;
  }

  get isUnauthenticated() {
    return this.status === 401;
  }
  get isForbidden() {
    return this.status === 403;
  }
  get isNotFound() {
    return this.status === 404;
  }
  /** The message for one form field, if the server named it. */
  fieldMessage(path: string): string | undefined {
    return this.issues.find((i) => i.path === path)?.message;
  }
}

const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
let csrfToken: Promise<string> | undefined;

async function fetchCsrfToken(): Promise<string> {
  const res = await fetch('/api/csrf', { credentials: 'same-origin' });
  if (!res.ok) throw await toApiError(res);
  const body = (await res.json()) as { token: string };
  return body.token;
}

/** Forget the CSRF token, e.g. after sign-in or sign-out (the session changed). */
export function resetCsrfToken(): void {
  csrfToken = undefined;
}

/** The CSRF token for a request sent outside `request`, e.g. an XHR that reports upload progress. */
export function csrfTokenForRequest(): Promise<string> {
  return (csrfToken ??= fetchCsrfToken());
}

/** An error answer (status, body text, Retry-After header) as the ApiError the UI shows. */
export function apiErrorFrom(status: number, bodyText: string, retryAfterHeader: string | null): ApiError {
  let code = 'http_error';
  let message = status >= 500 ? 'The server had a problem. Please try again.' : `Request failed (${status}).`;
  let issues: FieldIssue[] = [];
  try {
    const body = JSON.parse(bodyText) as {
      error?: { code?: string; message?: string };
      issues?: FieldIssue[];
    };
    code = body.error?.code ?? code;
    message = body.error?.message ?? message;
    issues = body.issues ?? [];
  } catch {
    // not JSON: keep the generic message
  }
  return new ApiError(status, code, message, issues, Number(retryAfterHeader) || undefined);
}

async function toApiError(res: Response): Promise<ApiError> {
  const text = await res.text().catch(() => '');
  return apiErrorFrom(res.status, text, res.headers.get('Retry-After'));
}

export interface RequestOptions {
  method?: string;
  body?: unknown;
  signal?: AbortSignal;
  headers?: Record<string, string>;
}

export async function request<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const method = (options.method ?? 'GET').toUpperCase();
  const headers: Record<string, string> = { Accept: 'application/json', ...options.headers };
  let body: BodyInit | undefined;
  if (options.body instanceof FormData) body = options.body;
  else if (options.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.body);
  }
  const send = async () => {
    if (UNSAFE.has(method)) headers['X-CSRF-Token'] = await csrfTokenForRequest();
    return fetch(`/api${path}`, {
      method,
      headers,
      body,
      credentials: 'same-origin',
      signal: options.signal,
    });
  };
  let res = await send();
  if (res.status === 403 && UNSAFE.has(method)) {
    // The token may belong to an older session: fetch a fresh one and try once more.
    const err = await toApiError(res.clone());
    if (err.code === 'csrf_invalid') {
      resetCsrfToken();
      res = await send();
    }
  }
  if (!res.ok) throw await toApiError(res);
  if (res.status === 204) return undefined as T;
  return (await res.json()) as T;
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => request<T>(path, { signal }),
  post: <T>(path: string, body?: unknown) => request<T>(path, { method: 'POST', body }),
  put: <T>(path: string, body?: unknown) => request<T>(path, { method: 'PUT', body }),
  patch: <T>(path: string, body?: unknown) => request<T>(path, { method: 'PATCH', body }),
  delete: <T = void>(path: string) => request<T>(path, { method: 'DELETE' }),
};
