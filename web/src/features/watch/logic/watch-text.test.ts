import { describe, expect, it } from 'vitest';
import type { CompletionDto } from '@core/contracts';
import { currentState, formatClock, formatSchoolTime, zoneName } from './watch-text';

// Hand-computed: 17:00 UTC on Thu 3 Dec 2026 is 17:00 in London (GMT, no summer time) and 18:00 in Paris.
describe('watch texts', () => {
  it('shows a due time in the school’s zone, whatever the machine’s zone', () => {
    expect(formatSchoolTime('2026-12-03T17:00:00.000Z', { timeZone: 'Europe/London', locale: 'en-GB' })).toBe('Thu 3 Dec, 17:00');
    expect(formatSchoolTime('2026-12-03T17:00:00.000Z', { timeZone: 'Europe/Paris', locale: 'en-GB' })).toBe('Thu 3 Dec, 18:00');
    expect(zoneName('2026-12-03T17:00:00.000Z', { timeZone: 'Europe/London', locale: 'en-GB' })).toBe('GMT');
  });

  it('writes a resume point as minutes and seconds', () => {
    expect(formatClock(161_400)).toBe('02:41');
    expect(formatClock(999)).toBe('00:00');
    expect(formatClock(3_762_000)).toBe('1:02:42');
  });

  const completionOf = (done: boolean): CompletionDto => ({
    watchedShare: done ? 0.95 : 0.5,
    watchShareNeeded: 0.9,
    requiredAnswered: 1,
    requiredTotal: 1,
    done,
    completedAt: done ? '2026-12-03T16:00:00.000Z' : null,
  });
  it('keeps the loaded state until a reply says the lesson is complete; done wins', () => {
    expect(currentState('in-progress', completionOf(false))).toBe('in-progress');
    expect(currentState('in-progress', completionOf(true))).toBe('done');
    expect(currentState('late', completionOf(true))).toBe('done');
  });
});
