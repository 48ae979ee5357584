import { describe, expect, it } from 'vitest';
import { completionOf, type CompletionInput } from './completion';

// Hand-computed cases of the completion rule: every required checkpoint answered and at least the share watched.
const base: CompletionInput = {
  watchedSeconds: 9,
  totalSeconds: 10,
  requiredAnswered: 3,
  requiredTotal: 3,
  watchShareNeeded: 0.9,
  completedAt: null,
};

describe('completionOf', () => {
  it('is done with every required answer and exactly the share watched', () => {
    expect(completionOf(base)).toEqual({
      watchedShare: 0.9,
      watchShareNeeded: 0.9,
      requiredAnswered: 3,
      requiredTotal: 3,
      done: true,
      completedAt: null,
    });
  });

  it('is not done one second short, or one required answer short', () => {
    expect(completionOf({ ...base, watchedSeconds: 8 }).done).toBe(false);
    expect(completionOf({ ...base, watchedSeconds: 10, requiredAnswered: 2 }).done).toBe(false);
  });

  it('does not ask for an extra second through rounding (0.7 × 10 = 7.000000000000001 in floating point)', () => {
    expect(completionOf({ ...base, watchedSeconds: 7, watchShareNeeded: 0.7 }).done).toBe(true);
    expect(completionOf({ ...base, watchedSeconds: 6, watchShareNeeded: 0.7 }).done).toBe(false);
    // 90 % of 11 s is 9.9 s: ten whole seconds.
    expect(completionOf({ ...base, watchedSeconds: 9, totalSeconds: 11 }).done).toBe(false);
    expect(completionOf({ ...base, watchedSeconds: 10, totalSeconds: 11 }).done).toBe(true);
  });

  it('needs only watching without required checkpoints, and only answers with a share of 0', () => {
    expect(completionOf({ ...base, requiredAnswered: 0, requiredTotal: 0 }).done).toBe(true);
    expect(completionOf({ ...base, watchedSeconds: 0, watchShareNeeded: 0 }).done).toBe(true);
  });

  it('reads a recording of no seconds as fully watched and caps the share at 1', () => {
    expect(completionOf({ ...base, watchedSeconds: 0, totalSeconds: 0 }).watchedShare).toBe(1);
    expect(completionOf({ ...base, watchedSeconds: 12 }).watchedShare).toBe(1);
  });

  it('stays done once completed, with the time it first became done', () => {
    const completedAt = new Date('2026-12-02T10:15:00Z');
    expect(completionOf({ ...base, watchedSeconds: 2, completedAt })).toMatchObject({
      done: true,
      completedAt: '2026-12-02T10:15:00.000Z',
      watchedShare: 0.2,
    });
  });
});
