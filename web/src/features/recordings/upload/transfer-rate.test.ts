import { describe, expect, it } from 'vitest';
import { formatRate, formatTimeLeft, initialRate, nextRate, percentOf, rebaseRate, secondsLeft } from './transfer-rate';

const MIB = 1024 * 1024;

describe('upload rate', () => {
  it('needs two samples before it knows a rate', () => {
    const first = nextRate(initialRate, 0, 1000);
    expect(first.bytesPerSecond).toBeNull();
    const second = nextRate(first, 2 * MIB, 2000);
    expect(second.bytesPerSecond).toBe(2 * MIB);
  });

  it('smooths: one fast interval moves the estimate only part of the way', () => {
    let state = nextRate(nextRate(initialRate, 0, 0), 2 * MIB, 1000); // 2 MiB/s
    state = nextRate(state, 2 * MIB + 12 * MIB, 2000); // an interval at 12 MiB/s
    const rate = state.bytesPerSecond ?? 0;
    // Weight of a 1 s interval with a 5 s time constant: 1 - e^(-1/5) ≈ 0.181 -> 2 + 0.181 * 10 ≈ 3.81 MiB/s.
    expect(rate / MIB).toBeCloseTo(2 + (1 - Math.exp(-0.2)) * 10, 5);
    expect(rate).toBeLessThan(12 * MIB);
  });

  it('ignores bursts of events closer than 200 ms, and re-bases after a part restarts', () => {
    const base = nextRate(nextRate(initialRate, 0, 0), MIB, 1000);
    expect(nextRate(base, 5 * MIB, 1050)).toBe(base);
    const restarted = nextRate(base, MIB / 2, 2000); // the total went down: a part is being sent again
    expect(restarted.bytesPerSecond).toBe(base.bytesPerSecond);
    expect(restarted.last).toEqual({ bytes: MIB / 2, at: 2000 });
  });

  it('does not count a pause as a slow interval', () => {
    const before = nextRate(nextRate(initialRate, 0, 0), 4 * MIB, 1000);
    const paused = rebaseRate(before);
    const after = nextRate(nextRate(paused, 4 * MIB, 600_000), 8 * MIB, 601_000);
    expect(after.bytesPerSecond).toBe(4 * MIB);
  });

  it('estimates time left from the rate', () => {
    expect(secondsLeft(10 * MIB, 100 * MIB, 2 * MIB)).toBe(45);
    expect(secondsLeft(10, 100, null)).toBeNull();
    expect(secondsLeft(10, 100, 0)).toBeNull();
  });
});

describe('upload formatting', () => {
  it('speed in MiB/s, slow links in KiB/s', () => {
    expect(formatRate(3.25 * MIB)).toBe('3.3 MiB/s');
    expect(formatRate(51_200)).toBe('50 KiB/s');
  });

  it('time left in seconds, minutes and hours', () => {
    expect(formatTimeLeft(41.2)).toBe('42 s left');
    expect(formatTimeLeft(130)).toBe('2 min 10 s left');
    expect(formatTimeLeft(12 * 60 + 5)).toBe('12 min left');
    expect(formatTimeLeft(3900)).toBe('1 h 5 min left');
  });

  it('percent never reads 100 before the last byte', () => {
    expect(percentOf(0, 0)).toBe(0);
    expect(percentOf(996, 1000)).toBe(99);
    expect(percentOf(1000, 1000)).toBe(100);
    expect(percentOf(250, 1000)).toBe(25);
  });
});
