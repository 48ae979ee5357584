import type { FailureCode, RecordingState } from '@core/contracts';

/**
 * Failures worth processing again: the same bytes may well succeed next time. Every other code is
 * a fact about the file (not a video, no video track, stops early, undecodable) or the upload
 * (empty, too large, size mismatch, over quota: the object is already deleted), and only a new
 * upload helps. The presenter's `retryable` flag and the retry route both read this.
 */
export const RETRYABLE_FAILURES: ReadonlySet<FailureCode> = new Set<FailureCode>(['processing_error', 'timed_out']);

export function isRetryable(state: RecordingState, failureCode: string | null): boolean {
  return state === 'failed' && failureCode !== null && RETRYABLE_FAILURES.has(failureCode as FailureCode);
}

/** Why a retry is refused, as a sentence for the 409. */
export function notRetryableReason(state: RecordingState, failureCode: string | null): string {
  switch (state) {
    case 'uploading':
      return 'This recording is still uploading: it is processed as soon as the upload completes.';
    case 'processing':
      return 'This recording is already being processed.';
    case 'ready':
      return 'This recording is ready: there is nothing to retry.';
    default:
      return failureCode === null
        ? 'This recording failed without a recorded reason, so it cannot be retried: upload the file again.'
        : 'Processing this file again would fail the same way: upload a corrected file instead.';
  }
}
