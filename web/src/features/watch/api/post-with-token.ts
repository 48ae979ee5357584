import type { z } from 'zod';
import { ApiErrorBodySchema } from '@core/contracts';
import { ApiError } from '@/lib/api-client';

/**
 * A POST with a CSRF token the caller holds, for the requests the shared client cannot make: the
 * answer queue must not be retried under a session that changed (the shared client refreshes the
 * token by itself on a mismatch), and viewing reports go out with `keepalive` so they outlive the page.
 * Failures are the shared client's `ApiError` (status 0 for no connection).
 */
export async function postWithToken(
  url: string,
  body: unknown,
  token: string | null,
  options: { keepalive?: boolean } = {},
): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json', 'Content-Type': 'application/json' };
  if (token) headers['X-CSRF-Token'] = token;
  let response: Response;
  try {
    response = await fetch(url, {
      method: 'POST',
      headers,
      credentials: 'same-origin',
      body: JSON.stringify(body),
      keepalive: options.keepalive === true,
    });
  } catch {
    throw new ApiError(0, 'network_error', 'Pinfield could not reach its server. Check your network connection.');
  }
  if (!response.ok) throw await errorOf(response);
  return response;
}

async function errorOf(response: Response): Promise<ApiError> {
  const text = await response.text().catch(() => '');
  try {
    const parsed = ApiErrorBodySchema.safeParse(JSON.parse(text));
    if (parsed.success) {
      const { code, message, details } = parsed.data.error;
      return new ApiError(response.status, code, message, details ?? []);
    }
  } catch {
    // Not JSON (a proxy's page, an empty body): a message from the status below.
  }
  return new ApiError(response.status, 'unexpected_response', `The server answered with status ${response.status} and no explanation.`);
}

/** The JSON reply read with its contract; a reply of another shape is an ApiError with the place it went wrong. */
export async function readReply<S extends z.ZodType>(response: Response, schema: S): Promise<z.output<S>> {
  let json: unknown;
  try {
    json = await response.json();
  } catch {
    throw new ApiError(response.status, 'unexpected_response', 'The server sent a reply Pinfield could not read (not JSON).');
  }
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    const where = parsed.error.issues[0]?.path.map(String).join('.') || 'the reply';
    throw new ApiError(response.status, 'unexpected_response', `The server sent a reply in an unexpected shape (at ${where}).`);
  }
  return parsed.data;
}
