import type { FailureCode } from '@core/contracts';

/**
 * A processing failure the teacher can act on: `code` is stored on the recording, `message` is shown
 * as written, `retryable` says whether running the job again could help (a PDF stays a PDF).
 */
export class MediaFailure extends Error {
  override readonly name = 'MediaFailure';

  constructor(
    readonly code: FailureCode,
    message: string,
    readonly retryable: boolean,
    options?: { cause?: unknown },
  ) {
    super(message, options);
  }
}

/** Fixed sentences, so the worker, the API and the tests agree on the wording. */
export const FAILURE_MESSAGES = {
  empty: 'The file is empty (0 bytes) — it may not have finished copying from the phone.',
  noVideoTrack: 'This file has no video track — it may be an audio recording.',
  incomplete: 'The file is incomplete — it may not have finished copying from the phone.',
  unreadable: 'This video could not be read — the file may be damaged, or in a format Pinfield cannot open.',
  noDuration: 'This video does not say how long it is, so Pinfield cannot prepare it — the file may be damaged.',
  unrecognised: 'This file is not a video: Pinfield does not recognise its type.',
  processing: 'Processing stopped with an unexpected error; trying again may help.',
} as const;

/** "The file stops early at 00:41 — …": the time is where the playable video ends. */
export function stopsEarlyMessage(formattedTime: string): string {
  return `The file stops early at ${formattedTime} — it may not have finished copying from the phone.`;
}

/** "This file is a PDF, not a video." from a kind of file-kinds.ts (unknown bytes get their own sentence). */
export function notVideoMessage(kind: { recognised: boolean; label: string }): string {
  return kind.recognised ? `This file is ${kind.label}, not a video.` : FAILURE_MESSAGES.unrecognised;
}
