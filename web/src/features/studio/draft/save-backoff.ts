import type { ApiError } from '@/lib/api-client';

/** Waits before retrying a failed save: 5 s, 10 s, 20 s, 40 s, then every 60 s (doubling, capped: common practice). */
export function retryDelayMs(attempt: number): number {
  return Math.min(60_000, 5000 * 2 ** Math.max(0, attempt - 1));
}

/**
 * Whether asking again can succeed by itself: no connection, a busy or failing server, a signed-out
 * session (the teacher may sign in again in another tab). A refused body (400, 403, 404, 413) will be
 * refused again until the content or the rights change.
 */
export function isRetryable(error: ApiError): boolean {
  return error.status === 0 || error.status === 401 || error.status === 408 || error.status === 429 || error.status >= 500;
}
