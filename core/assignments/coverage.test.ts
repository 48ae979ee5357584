import { describe, expect, it } from 'vitest';
import { addCoverage, audience, countWatched, intervalProblems, isWatched, recordingSeconds } from './coverage';

// Hand-computed cases: second s is watched when an interval [start, end) holds s*1000 + 500 (the
// last, shorter second of a 10.4 s recording: its own midpoint, 10 200 ms). Bit s is bit (7 − s % 8)
// of byte floor(s / 8), so seconds 0..7 are 0x80 >> s.
const iv = (startMs: number, endMs: number) => ({ startMs, endMs });
const watchedSeconds = (bits: Uint8Array, total: number) => Array.from({ length: total }, (_, s) => s).filter((s) => isWatched(bits, s));
const empty = new Uint8Array(0);

describe('recordingSeconds', () => {
  it('counts a started second as a second', () => {
    expect(recordingSeconds(0)).toBe(0);
    expect(recordingSeconds(1)).toBe(1);
    expect(recordingSeconds(1000)).toBe(1);
    expect(recordingSeconds(1001)).toBe(2);
    expect(recordingSeconds(10_400)).toBe(11);
    expect(() => recordingSeconds(-1)).toThrow("A recording's duration must be 0 ms or more, got -1.");
  });
});

describe('addCoverage', () => {
  it('marks a whole 10 s recording watched in two bytes, the unused bits clear', () => {
    const bits = addCoverage(empty, [iv(0, 10_000)], 10_000);
    expect([...bits]).toEqual([0xff, 0xc0]);
    expect(countWatched(bits)).toBe(10);
  });

  it('never loses or doubles a second where a report is split at a whole second', () => {
    const split = addCoverage(empty, [iv(0, 1_500), iv(1_500, 3_000)], 10_000);
    expect(watchedSeconds(split, 10)).toEqual([0, 1, 2]);
    expect([...split]).toEqual([...addCoverage(empty, [iv(0, 3_000)], 10_000)]);
  });

  it('gives a second split exactly at its midpoint to the later interval only', () => {
    expect(watchedSeconds(addCoverage(empty, [iv(0, 2_500)], 10_000), 10)).toEqual([0, 1]);
    expect(watchedSeconds(addCoverage(empty, [iv(2_500, 4_000)], 10_000), 10)).toEqual([2, 3]);
    expect(countWatched(addCoverage(empty, [iv(0, 2_500), iv(2_500, 4_000)], 10_000))).toBe(4);
  });

  it('counts overlapping intervals once', () => {
    const bits = addCoverage(empty, [iv(1_000, 5_000), iv(3_000, 8_000)], 10_000);
    expect(watchedSeconds(bits, 10)).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });

  it('counts a repeated interval once, within one report and across reports', () => {
    const once = addCoverage(empty, [iv(2_000, 4_000)], 10_000);
    expect([...addCoverage(empty, [iv(2_000, 4_000), iv(2_000, 4_000)], 10_000)]).toEqual([...once]);
    expect([...addCoverage(once, [iv(2_000, 4_000)], 10_000)]).toEqual([...once]);
    expect(countWatched(once)).toBe(2);
  });

  it('marks only what was played around a seek', () => {
    // Played 0 to 3.2 s, sought to 7 s, played to 9.1 s.
    const bits = addCoverage(empty, [iv(0, 3_200), iv(7_000, 9_100)], 10_000);
    expect(watchedSeconds(bits, 10)).toEqual([0, 1, 2, 7, 8]);
    expect([...bits]).toEqual([0b1110_0001, 0b1000_0000]);
  });

  it('marks nothing for zero-length intervals, and a second for a 2 ms interval around its midpoint', () => {
    expect(countWatched(addCoverage(empty, [iv(4_000, 4_000), iv(4_500, 4_500)], 10_000))).toBe(0);
    expect(watchedSeconds(addCoverage(empty, [iv(4_499, 4_501)], 10_000), 10)).toEqual([4]);
  });

  it('marks the short last second and cuts an overshoot within 1 s at the end', () => {
    expect(watchedSeconds(addCoverage(empty, [iv(10_000, 10_400)], 10_400), 11)).toEqual([10]);
    expect(watchedSeconds(addCoverage(empty, [iv(10_000, 10_199)], 10_400), 11)).toEqual([]);
    const overshoot = addCoverage(empty, [iv(9_000, 11_200)], 10_400);
    expect(watchedSeconds(overshoot, 11)).toEqual([9, 10]);
    expect([...overshoot]).toEqual([0x00, 0b0110_0000]);
    // Starting inside the allowance past the end: nothing left to mark.
    expect(countWatched(addCoverage(empty, [iv(10_900, 11_300)], 10_400))).toBe(0);
  });

  it('refuses bad intervals with their problems', () => {
    expect(() => addCoverage(empty, [iv(9_000, 11_401)], 10_400)).toThrow("Interval 1 ends at 11.4 s, after the recording's end (10.4 s).");
  });

  it('returns a new array sized for the recording and keeps the old bits that fit', () => {
    const old = new Uint8Array([0x80]);
    const next = addCoverage(old, [iv(9_000, 10_000)], 10_400);
    expect([...old]).toEqual([0x80]);
    expect([...next]).toEqual([0x80, 0b0100_0000]);
    // An array from a longer recording: bits past second 10 are dropped.
    expect([...addCoverage(new Uint8Array([0xff, 0xff, 0xff]), [], 10_400)]).toEqual([0xff, 0b1110_0000]);
    expect([...addCoverage(empty, [iv(0, 0)], 0)]).toEqual([]);
  });
});

describe('intervalProblems', () => {
  it('is empty for good intervals, including up to 1 s past the end', () => {
    expect(intervalProblems([iv(0, 10_000), iv(3_000, 3_000), iv(10_000, 11_000)], 10_000)).toEqual([]);
  });

  it('names each bad interval by its place in the report', () => {
    expect(
      intervalProblems([iv(0, 1_000), iv(4_000, 3_000), iv(-500, 2_000), iv(12_500, 12_500), iv(9_000, 12_400), iv(0.5, 2_000)], 10_000),
    ).toEqual([
      'Interval 2 ends at 3.0 s, before it starts (4.0 s).',
      "Interval 3 starts at -0.5 s, before the recording's start.",
      "Interval 4 starts at 12.5 s, after the recording's end (10.0 s).",
      "Interval 5 ends at 12.4 s, after the recording's end (10.0 s).",
      'Interval 6 must start and end at whole milliseconds.',
    ]);
  });
});

describe('countWatched and audience', () => {
  it('counts set bits', () => {
    expect(countWatched(new Uint8Array([0xff, 0x01, 0x00, 0b1010_1010]))).toBe(13);
    expect(countWatched(empty)).toBe(0);
  });

  it('counts per second how many students watched it; a short bitset counts as unwatched', () => {
    const a = new Uint8Array([0b1100_0000, 0b1000_0000]); // seconds 0, 1, 8
    const b = new Uint8Array([0b0110_0000]); // seconds 1, 2
    const c = new Uint8Array([0b1000_0001, 0b1000_0000]); // seconds 0, 7, 8
    expect(audience([a, b, c], 10)).toEqual([2, 2, 1, 0, 0, 0, 0, 1, 2, 0]);
    expect(audience([], 3)).toEqual([0, 0, 0]);
  });
});
