/**
 * Upload speed and time left from the progress events of one file. The rate is an exponentially weighted
 * moving average of the instantaneous rate (time constant RATE_SMOOTHING_SECONDS), so one slow or fast
 * part does not make the estimate jump; a gap (pause, retry, restored parts) resets the baseline
 * instead of counting as a very slow or very fast interval.
 */
export type RateState = {
  /** The last sample: bytes sent so far, at this time (ms). Null before the first sample. */
  last: { bytes: number; at: number } | null;
  /** Smoothed bytes per second, or null until two samples far enough apart were seen. */
  bytesPerSecond: number | null;
};

export const RATE_SMOOTHING_SECONDS = 5;
/** Samples closer together than this are merged into the next one (XHR progress can fire every few ms). */
const MIN_INTERVAL_MS = 200;
/** A longer silence is a stall or a pause, not a rate: start measuring again from the next sample. */
const MAX_INTERVAL_MS = 30_000;

export const initialRate: RateState = { last: null, bytesPerSecond: null };

/** The next rate state after `bytes` bytes were sent in total, observed at `at` (ms). */
export function nextRate(state: RateState, bytes: number, at: number): RateState {
  const { last } = state;
  if (!last) return { last: { bytes, at }, bytesPerSecond: state.bytesPerSecond };
  const elapsedMs = at - last.at;
  if (elapsedMs < MIN_INTERVAL_MS) return state;
  const sent = bytes - last.bytes;
  // A part that restarted after a failure sends its bytes again (the total goes down): re-base without a rate.
  if (sent < 0 || elapsedMs > MAX_INTERVAL_MS) return { last: { bytes, at }, bytesPerSecond: state.bytesPerSecond };
  const instant = (sent * 1000) / elapsedMs;
  const weight = 1 - Math.exp(-elapsedMs / 1000 / RATE_SMOOTHING_SECONDS);
  const smoothed = state.bytesPerSecond === null ? instant : state.bytesPerSecond + weight * (instant - state.bytesPerSecond);
  return { last: { bytes, at }, bytesPerSecond: smoothed };
}

/** Forget the baseline (after a pause or before a retry) but keep the last known rate for the estimate. */
export function rebaseRate(state: RateState): RateState {
  return { last: null, bytesPerSecond: state.bytesPerSecond };
}

/** Seconds until the rest is sent at this rate, or null when no estimate is possible yet. */
export function secondsLeft(bytesSent: number, bytesTotal: number, bytesPerSecond: number | null): number | null {
  if (bytesPerSecond === null || bytesPerSecond <= 0) return null;
  return Math.max(0, (bytesTotal - bytesSent) / bytesPerSecond);
}

const MIB = 1024 * 1024;

/** 3_407_872 bytes/s -> "3.3 MiB/s"; slow links read in KiB/s so they do not show as 0.0. */
export function formatRate(bytesPerSecond: number): string {
  if (bytesPerSecond < 0.1 * MIB) return `${Math.max(0, Math.round(bytesPerSecond / 1024))} KiB/s`;
  return `${(bytesPerSecond / MIB).toFixed(1)} MiB/s`;
}

/** 42 -> "42 s left", 130 -> "2 min 10 s left", 3900 -> "1 h 5 min left". */
export function formatTimeLeft(seconds: number): string {
  const whole = Math.ceil(seconds);
  if (whole < 60) return `${whole} s left`;
  const h = Math.floor(whole / 3600);
  const m = Math.floor((whole % 3600) / 60);
  const s = whole % 60;
  if (h > 0) return `${h} h ${m} min left`;
  return s > 0 && m < 10 ? `${m} min ${s} s left` : `${m} min left`;
}

/** Whole percent, never 100 before the last byte is sent (a rounded 99.6 % must not read as done). */
export function percentOf(bytesSent: number, bytesTotal: number): number {
  if (bytesTotal <= 0) return 0;
  if (bytesSent >= bytesTotal) return 100;
  return Math.min(99, Math.floor((bytesSent / bytesTotal) * 100));
}
