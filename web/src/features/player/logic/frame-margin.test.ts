import { describe, expect, it } from 'vitest';
import {
  CALLBACK_GAP_FACTOR,
  CallbackGaps,
  DEFAULT_CALLBACK_GAP_MS,
  frameMarginMs,
  GAP_HISTORY,
  MAX_CALLBACK_GAP_MS,
  pauseBeforePin,
} from './frame-margin';

// Hand-computed cases.
describe('CallbackGaps', () => {
  it('starts from the default gap, then keeps the worst recent one', () => {
    const gaps = new CallbackGaps();
    expect(gaps.worst()).toBe(DEFAULT_CALLBACK_GAP_MS);
    gaps.note(20, 40, 2);
    gaps.note(61, 80, 2);
    gaps.note(21, 42, 2);
    expect(gaps.worst()).toBe(61);
  });

  it('counts a skipped frame through the media step when the wall gap looks short', () => {
    const gaps = new CallbackGaps();
    // 125 ms of media at 2x is 62.5 ms of wall time, though the callbacks came 30 ms apart.
    gaps.note(30, 125, 2);
    expect(gaps.worst()).toBe(62.5);
  });

  it('caps a long stall and forgets gaps older than its history', () => {
    const gaps = new CallbackGaps();
    gaps.note(2000, 0, 1);
    expect(gaps.worst()).toBe(MAX_CALLBACK_GAP_MS);
    for (let i = 0; i < GAP_HISTORY; i += 1) gaps.note(40, 40, 1);
    expect(gaps.worst()).toBe(40);
  });

  it('ignores gaps that cannot be (zero, negative)', () => {
    const gaps = new CallbackGaps();
    gaps.note(0, 0, 1);
    gaps.note(-5, -5, 1);
    expect(gaps.worst()).toBe(DEFAULT_CALLBACK_GAP_MS);
  });
});

describe('frameMarginMs', () => {
  it('scales with the playback rate and the gap', () => {
    expect(CALLBACK_GAP_FACTOR).toBe(2);
    // 2 × 40 ms of wall time: 80 ms of media at 1x, 160 ms at 2x.
    expect(frameMarginMs(40, 1)).toBe(80);
    expect(frameMarginMs(40, 2)).toBe(160);
    expect(frameMarginMs(1000, 1)).toBe(2 * MAX_CALLBACK_GAP_MS);
    expect(frameMarginMs(40, 0)).toBe(80);
  });
});

describe('pauseBeforePin', () => {
  it('pauses once the margin reaches the pin, and when at or past it', () => {
    expect(pauseBeforePin(900, 80, 1000)).toBe(false);
    expect(pauseBeforePin(919, 80, 1000)).toBe(true);
    expect(pauseBeforePin(1000, 80, 1000)).toBe(true);
    expect(pauseBeforePin(1200, 80, 1000)).toBe(true);
  });
});
