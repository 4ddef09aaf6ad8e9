/**
 * The one HTTP client of the web app: JSON in and out, cookies for the session, and every
 * failure turned into an `ApiError` whose message a person can act on. A 401 calls
 * `onUnauthorized` (the app sends the user to the sign-in page).
 */

/** One problem with a request, as the server's error handler reports it (`path` from ajv). */
export interface ApiErrorDetail {
  path: string;
  message: string;
}

/** A failed request: HTTP status (0 when the server could not be reached), code and message. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: readonly ApiErrorDetail[] = [],
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export interface RequestOptions {
  query?: Record<string, string | number | boolean | undefined>;
  /** JSON-encoded, except FormData (multipart uploads), which is sent as it is. */
  body?: unknown;
  signal?: AbortSignal;
}

export interface ApiClient {
  request<T>(method: string, path: string, options?: RequestOptions): Promise<T>;
  get<T>(path: string, options?: Omit<RequestOptions, 'body'>): Promise<T>;
  post<T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'body'>): Promise<T>;
  patch<T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'body'>): Promise<T>;
  put<T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'body'>): Promise<T>;
  delete<T>(path: string, options?: Omit<RequestOptions, 'body'>): Promise<T>;
  /** The address of a path for a plain link (downloads, CSV): base, path and query. */
  url(path: string, query?: RequestOptions['query']): string;
}

export interface ApiClientOptions {
  /** Prefix of every path; default '/api' (Vite proxies it to the team server in development). */
  baseUrl?: string;
  fetch?: typeof fetch;
  /** Called once per 401 before the error is thrown. */
  onUnauthorized?: () => void;
}

/** What the server says when it fails: `{ error: { code, message, details } }`. */
interface ErrorBody {
  error?: { code?: unknown; message?: unknown; details?: unknown };
}

const FALLBACK: Record<number, string> = {
  400: 'The request was not accepted.',
  401: 'Your session has ended. Sign in again.',
  403: 'You do not have the right to do this. Ask a project admin.',
  404: 'Not found: it may have been deleted, or the link is wrong.',
  409: 'Someone else changed this meanwhile. Reload and try again.',
  413: 'The upload is too large.',
  429: 'Too many requests. Wait a moment and try again.',
};

function fallbackMessage(status: number): string {
  if (FALLBACK[status]) return FALLBACK[status];
  if (status >= 500) return `The team server is not available (HTTP ${status}). Try again in a moment.`;
  return `The request failed (HTTP ${status}).`;
}

function toDetails(raw: unknown): ApiErrorDetail[] {
  if (!Array.isArray(raw)) return [];
  return raw
    .filter((d): d is Record<string, unknown> => typeof d === 'object' && d !== null)
    .map((d) => ({ path: String(d.path ?? ''), message: String(d.message ?? '') }));
}

/** Read a failed response into an ApiError; a body that is not the server's JSON shape falls back to a status message. */
async function errorFrom(res: Response): Promise<ApiError> {
  let body: ErrorBody | undefined;
  if ((res.headers.get('content-type') ?? '').includes('json')) {
    try {
      body = (await res.json()) as ErrorBody;
    } catch {
      body = undefined;
    }
  }
  const e = body?.error;
  const code = typeof e?.code === 'string' ? e.code : `http-${res.status}`;
  const message = typeof e?.message === 'string' && e.message ? e.message : fallbackMessage(res.status);
  return new ApiError(res.status, code, message, toDetails(e?.details));
}

function withQuery(url: string, query: RequestOptions['query']): string {
  if (!query) return url;
  const qs = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v !== undefined) qs.set(k, String(v));
  const s = qs.toString();
  return s ? `${url}?${s}` : url;
}

/** Create the client. One instance for the app, made in src/main.tsx. */
export function createApiClient(options: ApiClientOptions = {}): ApiClient {
  const base = options.baseUrl ?? '/api';
  const doFetch = options.fetch ?? ((input, init) => globalThis.fetch(input, init));

  async function request<T>(method: string, path: string, o: RequestOptions = {}): Promise<T> {
    const headers: Record<string, string> = { Accept: 'application/json' };
    const form = typeof FormData !== 'undefined' && o.body instanceof FormData;
    // The browser sets the multipart boundary itself.
    if (o.body !== undefined && !form) headers['Content-Type'] = 'application/json';
    let res: Response;
    try {
      res = await doFetch(withQuery(`${base}${path}`, o.query), {
        method,
        headers,
        credentials: 'same-origin',
        body: o.body === undefined ? undefined : form ? (o.body as FormData) : JSON.stringify(o.body),
        signal: o.signal,
      });
    } catch (err) {
      if (err instanceof DOMException && err.name === 'AbortError') throw err;
      throw new ApiError(0, 'network', 'Cannot reach the team server. Check the connection and try again.');
    }
    if (res.status === 401) options.onUnauthorized?.();
    if (!res.ok) throw await errorFrom(res);
    if (res.status === 204) return undefined as T;
    if (!(res.headers.get('content-type') ?? '').includes('json')) {
      throw new ApiError(res.status, 'bad-response', 'The server answered with something other than JSON: is the team server running behind /api?');
    }
    return (await res.json()) as T;
  }

  return {
    request,
    get: (path, o) => request('GET', path, o),
    post: (path, body, o) => request('POST', path, { ...o, body }),
    patch: (path, body, o) => request('PATCH', path, { ...o, body }),
    put: (path, body, o) => request('PUT', path, { ...o, body }),
    delete: (path, o) => request('DELETE', path, o),
    url: (path, query) => withQuery(`${base}${path}`, query),
  };
}

/** A message for any error the UI catches: ApiError's own, else a generic one. */
export function errorMessage(err: unknown): string {
  if (err instanceof ApiError) return err.message;
  if (err instanceof Error && err.message) return err.message;
  return 'Something went wrong.';
}
