import { describe, expect, it } from 'vitest';
import type { CheckpointGradeDto } from '@core/contracts';
import {
  canTryAgain,
  hasAnswered,
  isFinished,
  isPending,
  latestAnswer,
  nextAttempt,
  recordGrade,
  recordOf,
  recordQueued,
  recordRefused,
  tryAgainLabel,
} from './attempts';

const grade = (over: Partial<CheckpointGradeDto>): CheckpointGradeDto => ({
  correct: false,
  score: 0,
  feedback: 'Not this one.',
  mistake: null,
  invalid: false,
  attemptsLeft: 1,
  hints: [],
  reveal: null,
  ...over,
});
const answer = { kind: 'numeric' as const, text: '4 mT' };

describe('attempt book', () => {
  it('starts at attempt 1 and counts read answers', () => {
    let book = {};
    expect(nextAttempt(book, 'k')).toBe(1);
    book = recordGrade(book, 'k', 1, answer, grade({}));
    expect(nextAttempt(book, 'k')).toBe(2);
    expect(hasAnswered(recordOf(book, 'k'))).toBe(true);
    expect(canTryAgain(recordOf(book, 'k'))).toBe(true);
  });

  it('keeps the attempt when the server could not read the answer', () => {
    const book = recordGrade({}, 'k', 1, answer, grade({ invalid: true, feedback: 'Unknown unit "mTT".' }));
    expect(nextAttempt(book, 'k')).toBe(1);
    expect(hasAnswered(recordOf(book, 'k'))).toBe(false);
    expect(recordOf(book, 'k').answer).toBeNull();
    expect(canTryAgain(recordOf(book, 'k'))).toBe(false);
  });

  it('is finished when right or out of attempts', () => {
    const right = recordGrade({}, 'k', 1, answer, grade({ correct: true, score: 1 }));
    expect(isFinished(recordOf(right, 'k'))).toBe(true);
    expect(canTryAgain(recordOf(right, 'k'))).toBe(false);
    const spent = recordGrade({}, 'k', 2, answer, grade({ attemptsLeft: 0 }));
    expect(isFinished(recordOf(spent, 'k'))).toBe(true);
    expect(canTryAgain(recordOf(spent, 'k'))).toBe(false);
    expect(isFinished(recordOf({}, 'k'))).toBe(false);
  });
});

describe('attempt book with queued answers', () => {
  it('counts a queued answer as given, blocks a retry, and clears it when its grade arrives', () => {
    let book = recordQueued({}, 'k', 1, answer);
    const queued = recordOf(book, 'k');
    expect(hasAnswered(queued)).toBe(true);
    expect(isPending(queued)).toBe(true);
    expect(nextAttempt(book, 'k')).toBe(2);
    expect(canTryAgain(queued)).toBe(false);
    expect(latestAnswer(queued)).toEqual(answer);
    book = recordGrade(book, 'k', 1, answer, grade({}));
    expect(isPending(recordOf(book, 'k'))).toBe(false);
    expect(recordOf(book, 'k').used).toBe(1);
    expect(canTryAgain(recordOf(book, 'k'))).toBe(true);
  });

  it('drops a refused answer without counting it', () => {
    const book = recordRefused(recordQueued({}, 'k', 1, answer), 'k', 1);
    expect(hasAnswered(recordOf(book, 'k'))).toBe(false);
    expect(nextAttempt(book, 'k')).toBe(1);
  });

  it('labels a new attempt "Change my answer" when feedback is hidden', () => {
    const hidden = recordGrade({}, 'k', 1, answer, grade({ correct: null }), true);
    expect(tryAgainLabel(recordOf(hidden, 'k'))).toBe('Change my answer');
    expect(canTryAgain(recordOf(hidden, 'k'))).toBe(true);
    expect(tryAgainLabel(recordOf(recordGrade({}, 'k', 1, answer, grade({})), 'k'))).toBe('Try again');
  });
});
