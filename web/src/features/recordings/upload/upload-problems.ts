import { isApiError } from '@/lib/api-client';

/**
 * Why a file did not go up, in the words its row shows:
 * - `storage`: storage (or Pinfield's server) could not be reached; the file stays queued for Retry.
 * - `refused`: the API refused the file itself (too large, not a video, empty): sending it again cannot help.
 * - `failed`: anything else; Retry is offered.
 */
export type UploadProblem = { kind: 'storage' | 'refused' | 'failed'; message: string; retryable: boolean };

export const STORAGE_DOWN_MESSAGE = 'Storage is not reachable right now — this file stays in the queue and is sent when you press Retry.';

/** Refusals about the file itself; a full quota may change after deleting recordings, so it stays retryable. */
const PERMANENT_REFUSALS = new Set(['too_large', 'not_video', 'empty', 'size_mismatch', 'validation_failed']);

/**
 * Uppy's part upload attaches the XMLHttpRequest to its errors as `source`: `undefined` when the error did
 * not come from a part request at all, `null` or status 0 when the request got no answer (network down).
 */
function partRequestStatus(error: unknown): number | null | undefined {
  if (typeof error !== 'object' || error === null || !('source' in error)) return undefined;
  const source: unknown = error.source;
  if (typeof source !== 'object' || source === null) return null;
  // Read, not tested with `in`: the request object may be a wrapper whose `status` is a getter.
  const status = (source as { status?: unknown }).status;
  return typeof status === 'number' ? status : null;
}

export function describeUploadProblem(error: unknown): UploadProblem {
  if (isApiError(error)) {
    if (error.status === 0 || error.code === 'storage_unavailable' || error.status === 502 || error.status === 504) {
      return { kind: 'storage', message: STORAGE_DOWN_MESSAGE, retryable: true };
    }
    if (error.status >= 400 && error.status < 500 && ![401, 403, 408, 429].includes(error.status)) {
      return { kind: 'refused', message: error.message, retryable: !PERMANENT_REFUSALS.has(error.code) };
    }
    return { kind: 'failed', message: error.message, retryable: true };
  }
  const status = partRequestStatus(error);
  // Parts go straight to storage: no answer at all (status 0) or a 5xx after the retries means storage is down.
  if (status === null || status === 0 || (status !== undefined && status >= 500)) {
    return { kind: 'storage', message: STORAGE_DOWN_MESSAGE, retryable: true };
  }
  if (status !== undefined) {
    return {
      kind: 'failed',
      message: `Storage refused a part of this file (status ${status}). Press Retry; if it happens again, tell your school’s administrator.`,
      retryable: true,
    };
  }
  const text = error instanceof Error && error.message ? ` (${error.message})` : '';
  return {
    kind: 'failed',
    message: `The upload stopped unexpectedly${text}. Press Retry to continue from the parts already stored.`,
    retryable: true,
  };
}
