import { describe, expect, it } from 'vitest';
import { addDaysToLocal, clockChangeNote, defaultDates, defaultLateUntil, readBackLocal, schoolDateTime } from './school-time';

// Hand-computed cases. Europe/London in 2026: the clocks go forward at 01:00 GMT on Sunday 29 March
// (01:00 → 02:00) and back at 02:00 BST on Sunday 25 October (02:00 → 01:00).

describe('addDaysToLocal', () => {
  it('moves the date and keeps the wall-clock time, across a month, a year and a clock change', () => {
    expect(addDaysToLocal('2026-12-03T17:00', 2)).toBe('2026-12-05T17:00');
    expect(addDaysToLocal('2026-12-30T17:00', 2)).toBe('2027-01-01T17:00');
    expect(addDaysToLocal('2026-03-28T01:30', 1)).toBe('2026-03-29T01:30');
  });

  it('answers null for text that is not a complete date and time', () => {
    expect(addDaysToLocal('', 1)).toBeNull();
    expect(addDaysToLocal('2026-12-03', 1)).toBeNull();
  });
});

describe('defaultDates', () => {
  it('opens now and is due a week from the school’s today at 17:00, in the school’s zone', () => {
    // 23:30 UTC on 10 June is 00:30 BST on 11 June at the school.
    const now = new Date('2026-06-10T23:30:40.000Z');
    expect(defaultDates(now, 'Europe/London')).toEqual({ opensAt: '2026-06-11T00:30', dueAt: '2026-06-18T17:00' });
    expect(defaultDates(now, 'UTC')).toEqual({ opensAt: '2026-06-10T23:30', dueAt: '2026-06-17T17:00' });
  });

  it('suggests late answers until two days after the due time', () => {
    expect(defaultLateUntil('2026-06-18T17:00')).toBe('2026-06-20T17:00');
    expect(defaultLateUntil('')).toBe('');
  });
});

describe('clockChangeNote', () => {
  it('explains a time the clocks skip, and where it moves', () => {
    expect(clockChangeNote('2026-03-29T01:30', 'Europe/London')).toBe(
      '01:30 does not exist on that day in Europe/London (the clocks go forward): it will be 02:30.',
    );
  });

  it('explains a time that happens twice, and which one counts', () => {
    expect(clockChangeNote('2026-10-25T01:30', 'Europe/London')).toBe(
      '01:30 happens twice on that day in Europe/London (the clocks go back): Pinfield takes the first, before the change.',
    );
  });

  it('says nothing about ordinary, incomplete or zone-less times', () => {
    expect(clockChangeNote('2026-03-29T02:30', 'Europe/London')).toBeNull();
    expect(clockChangeNote('2026-10-25T02:30', 'Europe/London')).toBeNull();
    expect(clockChangeNote('2026-12-03T09:00', 'Europe/London')).toBeNull();
    expect(clockChangeNote('2026-03-29T01:30', 'UTC')).toBeNull();
    expect(clockChangeNote('2026-03-29', 'Europe/London')).toBeNull();
  });
});

describe('schoolDateTime', () => {
  it('shows an instant in the school’s zone with the zone’s abbreviation', () => {
    expect(schoolDateTime('2026-12-03T17:00:00.000Z', 'Europe/London', 'en-GB')).toBe('Thu, 3 Dec 2026, 17:00 GMT');
    expect(schoolDateTime('2026-06-03T16:00:00.000Z', 'Europe/London', 'en-GB')).toBe('Wed, 3 Jun 2026, 17:00 BST');
  });

  it('still shows the date when the zone is unknown', () => {
    expect(schoolDateTime('2026-12-03T17:00:00.000Z', 'Mars/Olympus', 'en-GB')).toMatch(/2026/);
  });
});

describe('readBackLocal', () => {
  it('reads a typed time back in the school’s words, after any clock-change move', () => {
    expect(readBackLocal('2026-12-09T17:00', 'Europe/London', 'en-GB')).toBe('Wed, 9 Dec 2026, 17:00 GMT');
    expect(readBackLocal('2026-03-29T01:30', 'Europe/London', 'en-GB')).toBe('Sun, 29 Mar 2026, 02:30 BST');
  });

  it('says nothing until the date and time are complete and real', () => {
    expect(readBackLocal('', 'Europe/London', 'en-GB')).toBeNull();
    expect(readBackLocal('2026-02-30T09:00', 'Europe/London', 'en-GB')).toBeNull();
  });
});
