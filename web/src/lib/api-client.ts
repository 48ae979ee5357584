import type { z } from 'zod';
import { ApiErrorBodySchema, CsrfDtoSchema } from '@core/contracts';

export type ApiErrorDetail = { path: string; message: string };

/** Every failure the API client reports: an HTTP error parsed from the API's error body, or a network failure (status 0). */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: ApiErrorDetail[] = [],
  ) {
    super(message);
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
type Query = Record<string, string | number | undefined>;

// The CSRF token lives in memory only: taken from GET /api/auth/csrf or from MeDto.csrfToken.
let csrfToken: string | null = null;
let csrfRequest: Promise<string> | null = null;

/** Remember a token the API handed out (MeDto.csrfToken); null forgets it (after sign-out). */
export function setCsrfToken(token: string | null): void {
  csrfToken = token;
}

async function fetchCsrfToken(): Promise<string> {
  // One request at a time: parallel mutations share the same fetch.
  csrfRequest ??= send('GET', '/api/auth/csrf')
    .then((response) => readBody(response, CsrfDtoSchema))
    .then((dto) => {
      csrfToken = dto.csrfToken;
      return dto.csrfToken;
    })
    .finally(() => {
      csrfRequest = null;
    });
  return csrfRequest;
}

function withQuery(path: string, query?: Query): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

/**
 * One request with the token given (no refresh on a mismatch); `keepalive` lets it outlive the page.
 * Failures are ApiErrors (status 0 for no connection). Most callers want `apiClient`, which also
 * refreshes the CSRF token; the answer queue must not (a changed session holds its answers back).
 */
export async function send(
  method: Method,
  url: string,
  body?: unknown,
  token?: string,
  options: { keepalive?: boolean } = {},
): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (token) headers['X-CSRF-Token'] = token;
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : JSON.stringify(body),
      keepalive: options.keepalive === true,
    });
  } catch {
    throw new ApiError(0, 'network_error', 'Pinfield could not reach its server. Check your network connection and try again.');
  }
  if (!response.ok) throw await toApiError(response);
  return response;
}

async function toApiError(response: Response): Promise<ApiError> {
  const text = await response.text().catch(() => '');
  try {
    const parsed = ApiErrorBodySchema.safeParse(JSON.parse(text));
    if (parsed.success) {
      const { code, message, details } = parsed.data.error;
      return new ApiError(response.status, code, message, details ?? []);
    }
  } catch {
    // Not JSON (a proxy's HTML page, an empty body): fall through to a message built from the status.
  }
  return new ApiError(
    response.status,
    'unexpected_response',
    `The server answered with status ${response.status} and no explanation. Try again in a moment.`,
  );
}

/** The JSON reply read with its contract; a reply of another shape is an ApiError naming where it went wrong. */
export async function readBody<S extends z.ZodType>(response: Response, schema: S): Promise<z.output<S>> {
  let json: unknown;
  try {
    json = await response.json();
  } catch {
    throw new ApiError(response.status, 'unexpected_response', 'The server sent a reply Pinfield could not read (not JSON).');
  }
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    const where = parsed.error.issues[0]?.path.join('.') || 'the reply';
    throw new ApiError(response.status, 'unexpected_response', `The server sent a reply in an unexpected shape (at ${where}).`);
  }
  return parsed.data;
}

async function request<S extends z.ZodType>(
  method: Method,
  path: string,
  options: { body?: unknown; query?: Query; schema?: S },
): Promise<z.output<S>> {
  const url = withQuery(path, options.query);
  let response: Response;
  if (method === 'GET') {
    response = await send(method, url);
  } else {
    const token = csrfToken ?? (await fetchCsrfToken());
    try {
      response = await send(method, url, options.body, token);
    } catch (error) {
      // A stale token (the session was regenerated at sign-in, or expired): fetch a fresh one and retry once.
      if (!(error instanceof ApiError && error.status === 403 && error.code === 'csrf_invalid')) throw error;
      csrfToken = null;
      response = await send(method, url, options.body, await fetchCsrfToken());
    }
  }
  if (!options.schema || response.status === 204) return undefined as z.output<S>;
  return readBody(response, options.schema);
}

/** The one way the web app talks to the API: same-origin cookies, JSON, CSRF on writes, typed errors. */
export const api = {
  get: <S extends z.ZodType>(path: string, schema: S, query?: Query) => request('GET', path, { schema, query }),
  post: <S extends z.ZodType>(path: string, body: unknown, schema?: S) => request('POST', path, { body, schema }),
  put: <S extends z.ZodType>(path: string, body: unknown, schema?: S) => request('PUT', path, { body, schema }),
  patch: <S extends z.ZodType>(path: string, body: unknown, schema?: S) => request('PATCH', path, { body, schema }),
  delete: (path: string) => request('DELETE', path, {}),
};
