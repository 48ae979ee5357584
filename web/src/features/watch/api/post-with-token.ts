import { send } from '@/lib/api-client';

/**
 * A POST with a CSRF token the caller holds, for the requests the shared client's refresh must not
 * touch: the answer queue is never retried under a session that changed, and viewing reports go out
 * with `keepalive` so they outlive the page. Failures are the shared client's `ApiError`.
 */
export function postWithToken(url: string, body: unknown, token: string | null, options: { keepalive?: boolean } = {}): Promise<Response> {
  return send('POST', url, body, token ?? undefined, options);
}
