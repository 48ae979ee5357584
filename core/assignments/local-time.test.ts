import { describe, expect, it } from 'vitest';
import { formatSchoolTime, instantToLocal, localToInstant } from './local-time';

// Hand-computed cases. UK clocks (Summer Time Act 1972 as amended by the Summer Time Order 2002,
// matching EU Directive 2000/84/EC): summer time starts at 01:00 UTC on the last Sunday of March
// (29 March 2026) and ends at 01:00 UTC on the last Sunday of October (25 October 2026). US rule
// (Energy Policy Act of 2005): second Sunday of March at 02:00 local (8 March 2026).
const iso = (date: Date) => date.toISOString();

describe('localToInstant', () => {
  it('reads winter and summer times in Europe/London', () => {
    expect(iso(localToInstant('2026-12-03T09:00', 'Europe/London'))).toBe('2026-12-03T09:00:00.000Z');
    expect(iso(localToInstant('2026-07-01T09:00', 'Europe/London'))).toBe('2026-07-01T08:00:00.000Z');
  });

  it('moves a time in the spring-forward gap forward by the gap', () => {
    expect(iso(localToInstant('2026-03-29T00:59', 'Europe/London'))).toBe('2026-03-29T00:59:00.000Z');
    // 01:00 to 01:59 do not happen: 01:30 reads as 02:30 summer time.
    expect(iso(localToInstant('2026-03-29T01:00', 'Europe/London'))).toBe('2026-03-29T01:00:00.000Z');
    expect(iso(localToInstant('2026-03-29T01:30', 'Europe/London'))).toBe('2026-03-29T01:30:00.000Z');
    expect(iso(localToInstant('2026-03-29T02:00', 'Europe/London'))).toBe('2026-03-29T01:00:00.000Z');
    expect(iso(localToInstant('2026-03-29T02:30', 'Europe/London'))).toBe('2026-03-29T01:30:00.000Z');
  });

  it('takes the earlier of a time that happens twice in the autumn', () => {
    expect(iso(localToInstant('2026-10-25T00:59', 'Europe/London'))).toBe('2026-10-24T23:59:00.000Z');
    // 01:30 happens at 00:30 UTC (summer time) and again at 01:30 UTC: the first one.
    expect(iso(localToInstant('2026-10-25T01:00', 'Europe/London'))).toBe('2026-10-25T00:00:00.000Z');
    expect(iso(localToInstant('2026-10-25T01:30', 'Europe/London'))).toBe('2026-10-25T00:30:00.000Z');
    expect(iso(localToInstant('2026-10-25T01:59', 'Europe/London'))).toBe('2026-10-25T00:59:00.000Z');
    expect(iso(localToInstant('2026-10-25T02:00', 'Europe/London'))).toBe('2026-10-25T02:00:00.000Z');
  });

  it('reads other zones, half-hour offsets and another gap', () => {
    expect(iso(localToInstant('2026-12-03T09:00', 'America/New_York'))).toBe('2026-12-03T14:00:00.000Z');
    expect(iso(localToInstant('2026-12-03T09:00', 'Asia/Kolkata'))).toBe('2026-12-03T03:30:00.000Z');
    expect(iso(localToInstant('2026-03-08T02:30', 'America/New_York'))).toBe('2026-03-08T07:30:00.000Z');
    expect(iso(localToInstant('2026-12-03T09:00', 'UTC'))).toBe('2026-12-03T09:00:00.000Z');
  });

  it('refuses malformed and impossible times and unknown zones with clear messages', () => {
    expect(() => localToInstant('2026-12-03 09:00', 'Europe/London')).toThrow(
      'Expected a date and time like 2026-12-03T09:00, got "2026-12-03 09:00".',
    );
    expect(() => localToInstant('2026-02-30T09:00', 'Europe/London')).toThrow('There is no such date and time as 2026-02-30T09:00.');
    expect(() => localToInstant('2026-12-03T24:00', 'Europe/London')).toThrow('There is no such date and time as 2026-12-03T24:00.');
    expect(() => localToInstant('2026-12-03T09:60', 'Europe/London')).toThrow('There is no such date and time');
    expect(() => localToInstant('2026-12-03T09:00', 'Europe/Nowhere')).toThrow('Unknown time zone "Europe/Nowhere"');
  });
});

describe('instantToLocal', () => {
  it('writes wall-clock times for form inputs, seconds dropped', () => {
    expect(instantToLocal('2026-12-03T09:00:59Z', 'Europe/London')).toBe('2026-12-03T09:00');
    expect(instantToLocal(new Date('2026-07-01T08:00:00Z'), 'Europe/London')).toBe('2026-07-01T09:00');
    expect(instantToLocal('2026-03-29T01:00:00Z', 'Europe/London')).toBe('2026-03-29T02:00');
    expect(instantToLocal('2026-12-31T23:30:00Z', 'Asia/Kolkata')).toBe('2027-01-01T05:00');
  });

  it('writes both instants of the repeated autumn hour as the same wall time', () => {
    expect(instantToLocal('2026-10-25T00:30:00Z', 'Europe/London')).toBe('2026-10-25T01:30');
    expect(instantToLocal('2026-10-25T01:30:00Z', 'Europe/London')).toBe('2026-10-25T01:30');
  });

  it('round-trips every quarter hour across both London transition days, except the repeated hour', () => {
    for (const day of ['2026-03-28T12:00:00Z', '2026-10-24T12:00:00Z']) {
      for (let step = 0; step < 24 * 4; step += 1) {
        const instant = new Date(Date.parse(day) + step * 15 * 60_000);
        const back = localToInstant(instantToLocal(instant, 'Europe/London'), 'Europe/London');
        const repeated = instant.getTime() >= Date.parse('2026-10-25T01:00:00Z') && instant.getTime() < Date.parse('2026-10-25T02:00:00Z');
        expect(back.getTime()).toBe(repeated ? instant.getTime() - 3_600_000 : instant.getTime());
      }
    }
  });

  it('refuses an invalid instant', () => {
    expect(() => instantToLocal('yesterday', 'Europe/London')).toThrow('Expected an instant (a date-time), got "yesterday".');
  });
});

describe('formatSchoolTime', () => {
  it('names the date in school time with the zone abbreviation', () => {
    expect(formatSchoolTime('2026-12-03T09:00:00Z', 'Europe/London', 'en-GB')).toBe('Thu, 3 Dec 2026, 09:00 GMT');
    expect(formatSchoolTime('2026-07-01T08:00:00Z', 'Europe/London', 'en-GB')).toBe('Wed, 1 Jul 2026, 09:00 BST');
  });
});
