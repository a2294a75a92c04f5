import { apiErrorBodySchema } from '#shared/api/api-error.ts';

export type ApiIssue = { path: string; message: string };

/** Every failed request ends as one of these; `code` is the server's kebab-case error code. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: ApiIssue[];
  /** From a Retry-After header (429), in seconds. */
  readonly retryAfterSeconds: number | null;

  constructor(init: {
    status: number;
    code: string;
    message: string;
    issues?: ApiIssue[];
    retryAfterSeconds?: number | null;
  }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.issues = init.issues ?? [];
    this.retryAfterSeconds = init.retryAfterSeconds ?? null;
  }
}

export function isApiError(error: unknown, code?: string): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

/**
 * Where the CSRF token comes from. The session query holds the latest token
 * (GET /api/auth/me, and every response that regenerates the session); the
 * app binds that query here at start-up (features/auth/api/bind-csrf.ts).
 */
export type CsrfSource = {
  get: () => string | undefined;
  /** Fetches a fresh token from the server and stores it where `get` reads it. */
  refresh: () => Promise<string>;
};

let csrfSource: CsrfSource | null = null;

export function setCsrfSource(source: CsrfSource | null) {
  csrfSource = source;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
type RequestOptions = { signal?: AbortSignal };
export type ApiResponse = { status: number; data: unknown };

const API_PREFIX = '/api';

function parseRetryAfter(value: string | null): number | null {
  if (!value) return null;
  const seconds = Number(value);
  if (Number.isFinite(seconds)) return Math.max(0, Math.ceil(seconds));
  const date = Date.parse(value);
  return Number.isNaN(date) ? null : Math.max(0, Math.ceil((date - Date.now()) / 1000));
}

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}

/**
 * The ApiError for a failed answer, from its status, parsed body and
 * Retry-After header. Exported for requests that cannot go through fetch
 * (photo uploads use XMLHttpRequest for their progress events).
 */
export function apiErrorFrom(status: number, body: unknown, retryAfter: string | null): ApiError {
  const parsed = apiErrorBodySchema.safeParse(body);
  const retryAfterSeconds = parseRetryAfter(retryAfter);
  if (parsed.success) {
    const { code, message, issues } = parsed.data.error;
    return new ApiError({ status, code, message, issues, retryAfterSeconds });
  }
  return new ApiError({
    status,
    code: `http-${status}`,
    message: status >= 500 ? 'Something went wrong on the server. Try again in a moment.' : `The server answered ${status}.`,
    retryAfterSeconds,
  });
}

function toApiError(response: Response, body: unknown): ApiError {
  return apiErrorFrom(response.status, body, response.headers.get('retry-after'));
}

/**
 * The session's CSRF token for a request made outside `apiClient` (an
 * XMLHttpRequest upload); `fresh` fetches a new one, after a `csrf-invalid`.
 */
export async function csrfTokenForRequest({ fresh = false } = {}): Promise<string | undefined> {
  if (!csrfSource) return undefined;
  if (fresh) return csrfSource.refresh();
  return csrfSource.get() ?? (await csrfSource.refresh());
}

async function send(
  method: Method,
  path: string,
  body: unknown,
  options: RequestOptions,
  csrfToken: string | undefined,
): Promise<Response> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (body !== undefined) headers['content-type'] = 'application/json';
  if (csrfToken) headers['x-csrf-token'] = csrfToken;
  try {
    return await fetch(`${API_PREFIX}${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: 'include',
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError({
      status: 0,
      code: 'network-error',
      message: 'Pourscope could not be reached. Check the connection and try again.',
    });
  }
}

/** One request, with the status kept, for endpoints whose status carries meaning (201 vs 202). */
async function request(
  method: Method,
  path: string,
  body?: unknown,
  options: RequestOptions = {},
): Promise<ApiResponse> {
  const needsCsrf = method !== 'GET';
  let token: string | undefined;
  if (needsCsrf && csrfSource) token = csrfSource.get() ?? (await csrfSource.refresh());

  let response = await send(method, path, body, options, token);
  let data = await readBody(response);

  // The session may have been regenerated elsewhere (another tab signed in):
  // fetch the current token once and try again.
  if (needsCsrf && csrfSource && response.status === 403) {
    const error = toApiError(response, data);
    if (error.code === 'csrf-invalid') {
      token = await csrfSource.refresh();
      response = await send(method, path, body, options, token);
      data = await readBody(response);
    }
  }

  if (!response.ok) throw toApiError(response, data);
  return { status: response.status, data };
}

export const apiClient = {
  request,
  get: async (path: string, options?: RequestOptions) =>
    (await request('GET', path, undefined, options)).data,
  post: async (path: string, body: unknown = {}, options?: RequestOptions) =>
    (await request('POST', path, body, options)).data,
  patch: async (path: string, body: unknown, options?: RequestOptions) =>
    (await request('PATCH', path, body, options)).data,
  delete: async (path: string, options?: RequestOptions) =>
    (await request('DELETE', path, undefined, options)).data,
};
