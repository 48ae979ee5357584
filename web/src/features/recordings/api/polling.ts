import type { RecordingDto } from '@core/contracts';

/** While something is on its way the page asks often; once everything has settled, rarely. */
export const BUSY_POLL_MS = 2_000;
export const IDLE_POLL_MS = 30_000;

export function isSettling(recording: Pick<RecordingDto, 'state'>): boolean {
  return recording.state === 'uploading' || recording.state === 'processing';
}

/** How long until the next refetch of recordings in these states. */
export function pollInterval(recordings: Pick<RecordingDto, 'state'>[] | undefined): number {
  return recordings?.some(isSettling) ? BUSY_POLL_MS : IDLE_POLL_MS;
}
