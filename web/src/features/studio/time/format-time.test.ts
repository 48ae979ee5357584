import { describe, expect, it } from 'vitest';
import { formatClock, formatTime, parseTime } from './format-time';

describe('formatTime', () => {
  it('writes minutes, seconds and milliseconds, and hours when needed', () => {
    expect(formatTime(0)).toBe('0:00.000');
    expect(formatTime(62_500)).toBe('1:02.500');
    expect(formatTime(3_723_040)).toBe('1:02:03.040');
    expect(formatTime(-5)).toBe('0:00.000');
    expect(formatTime(999.6)).toBe('0:01.000');
  });
  it('writes short clock labels', () => {
    expect(formatClock(62_000)).toBe('1:02');
    expect(formatClock(62_500, true)).toBe('1:02.5');
    expect(formatClock(5_000, true)).toBe('0:05.0');
  });
});

describe('parseTime', () => {
  it('reads the forms a teacher types', () => {
    expect(parseTime('1:02.500')).toEqual({ ok: true, ms: 62_500 });
    expect(parseTime(' 1:02 ')).toEqual({ ok: true, ms: 62_000 });
    expect(parseTime('62.5')).toEqual({ ok: true, ms: 62_500 });
    expect(parseTime('1:02:03.04')).toEqual({ ok: true, ms: 3_723_040 });
    expect(parseTime(formatTime(754_321))).toEqual({ ok: true, ms: 754_321 });
  });
  it('explains what is wrong', () => {
    expect(parseTime('')).toEqual({ ok: false, message: 'Enter a time, for example 1:02.500.' });
    expect(parseTime('abc')).toMatchObject({ ok: false, message: expect.stringContaining('minutes:seconds.milliseconds') });
    expect(parseTime('1:75')).toEqual({ ok: false, message: 'Seconds after the minutes must be below 60.' });
    expect(parseTime('1:60:00')).toEqual({ ok: false, message: 'Minutes after the hours must be below 60.' });
    expect(parseTime('1:02.5000').ok).toBe(false);
  });
});
