import type { WatchInterval } from '../contracts/watch';

/**
 * Per-second viewing coverage of a recording, one bit a second: bit s is bit (7 − s % 8) of byte
 * floor(s / 8). Second s counts as watched when a reported interval [startMs, endMs) holds its
 * midpoint, so a report split anywhere never loses or doubles a second. The last second of a
 * recording whose length is not whole seconds is shorter: its midpoint is that of its own span.
 */

/** How far past the recording's end a reported interval may run (players overshoot); the rest is cut off. */
export const END_ALLOWANCE_MS = 1_000;

function checkDuration(durationMs: number): void {
  if (!Number.isFinite(durationMs) || durationMs < 0)
    throw new RangeError(`A recording's duration must be 0 ms or more, got ${durationMs}.`);
}

/** The seconds of a recording of this length: ceil(durationMs / 1000). */
export function recordingSeconds(durationMs: number): number {
  checkDuration(durationMs);
  return Math.ceil(durationMs / 1000);
}

/** The bytes a coverage bitset of this many seconds takes. */
export function coverageBytes(seconds: number): number {
  return Math.ceil(seconds / 8);
}

const inSeconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

/** Sentences naming each bad interval (1-based, as reported); empty when all are fine. */
export function intervalProblems(intervals: WatchInterval[], durationMs: number): string[] {
  checkDuration(durationMs);
  const end = durationMs + END_ALLOWANCE_MS;
  const problems: string[] = [];
  intervals.forEach(({ startMs, endMs }, index) => {
    const name = `Interval ${index + 1}`;
    if (!Number.isInteger(startMs) || !Number.isInteger(endMs)) {
      problems.push(`${name} must start and end at whole milliseconds.`);
    } else if (startMs < 0) {
      problems.push(`${name} starts at ${inSeconds(startMs)}, before the recording's start.`);
    } else if (endMs < startMs) {
      problems.push(`${name} ends at ${inSeconds(endMs)}, before it starts (${inSeconds(startMs)}).`);
    } else if (startMs > end) {
      problems.push(`${name} starts at ${inSeconds(startMs)}, after the recording's end (${inSeconds(durationMs)}).`);
    } else if (endMs > end) {
      problems.push(`${name} ends at ${inSeconds(endMs)}, after the recording's end (${inSeconds(durationMs)}).`);
    }
  });
  return problems;
}

/** The midpoint of second s (ms): its own span's, which is shorter for the last second. */
function midpointMs(second: number, durationMs: number): number {
  const start = second * 1000;
  return (start + Math.min(start + 1000, durationMs)) / 2;
}

/**
 * The coverage with the intervals added, as a new array sized for the recording (bits of an
 * array sized otherwise are kept where they fit). Throws a RangeError naming the problems of bad
 * intervals: check them with intervalProblems first.
 */
export function addCoverage(bits: Uint8Array, intervals: WatchInterval[], durationMs: number): Uint8Array {
  const problems = intervalProblems(intervals, durationMs);
  if (problems.length > 0) throw new RangeError(problems.join(' '));
  const total = recordingSeconds(durationMs);
  const next = new Uint8Array(coverageBytes(total));
  next.set(bits.subarray(0, next.length));
  // Bits past the last second (an array from a longer recording) are cleared.
  if (total % 8 !== 0 && next.length > 0) next[next.length - 1] = (next[next.length - 1] ?? 0) & (0xff << (8 - (total % 8)));
  for (const { startMs, endMs } of intervals) {
    const end = Math.min(endMs, durationMs);
    // Only seconds whose midpoint can fall inside need checking.
    const first = Math.max(0, Math.floor(startMs / 1000));
    for (let s = first; s < total && s * 1000 < end; s += 1) {
      const mid = midpointMs(s, durationMs);
      if (mid >= startMs && mid < end) next[s >> 3] = (next[s >> 3] ?? 0) | (0x80 >> (s & 7));
    }
  }
  return next;
}

/** Whether second s is marked in the bitset. */
export function isWatched(bits: Uint8Array, second: number): boolean {
  return (((bits[second >> 3] ?? 0) >> (7 - (second & 7))) & 1) === 1;
}

/** The number of seconds marked. */
export function countWatched(bits: Uint8Array): number {
  let count = 0;
  for (const byte of bits) {
    let b = byte;
    while (b !== 0) {
      b &= b - 1;
      count += 1;
    }
  }
  return count;
}

/** For each second of the recording, how many of the bitsets (one a student) have it watched. */
export function audience(bitsets: Uint8Array[], seconds: number): number[] {
  const counts = new Array<number>(Math.max(0, seconds)).fill(0);
  for (const bits of bitsets) {
    for (let s = 0; s < counts.length; s += 1) if (isWatched(bits, s)) counts[s] = (counts[s] ?? 0) + 1;
  }
  return counts;
}
