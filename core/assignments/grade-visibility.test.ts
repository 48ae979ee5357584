import { describe, expect, it } from 'vitest';
import { FEEDBACK_POLICIES, REVEAL_POLICIES, type FeedbackPolicy, type RevealPolicy } from '../contracts/assignments';
import type { CheckpointGradeDto } from '../contracts/student-checkpoints';
import { visibleGrade } from './grade-visibility';

// Hand-built engine grades (the shapes gradeAttempt returns) and the hand-worked table of what each
// feedback × reveal policy shows in each situation.
const REVEAL = { answer: 'Towards east', explanation: 'CANARY-EXPLANATION' };
const AFTER_CLOSE = { answer: 'Towards east', explanation: 'CANARY-LATE-REVEAL' };

const wrongWithAttemptsLeft: CheckpointGradeDto = {
  correct: false,
  score: 0,
  feedback: 'CANARY-FEEDBACK: not this one.',
  mistake: 'distractor:d1',
  invalid: false,
  attemptsLeft: 2,
  hints: ['CANARY-HINT-1'],
  reveal: null,
};
const rightWithAttemptsLeft: CheckpointGradeDto = {
  correct: true,
  score: 1,
  feedback: 'CANARY-RIGHT: yes.',
  mistake: null,
  invalid: false,
  attemptsLeft: 2,
  hints: [],
  reveal: REVEAL,
};
const wrongOnLastAttempt: CheckpointGradeDto = {
  ...wrongWithAttemptsLeft,
  attemptsLeft: 0,
  hints: ['CANARY-HINT-1', 'CANARY-HINT-2'],
  reveal: REVEAL,
};
const unreadable: CheckpointGradeDto = {
  correct: false,
  score: 0,
  feedback: '"furlong" is not a unit this question knows.',
  mistake: null,
  invalid: true,
  attemptsLeft: 3,
  hints: ['CANARY-HINT-1'],
  reveal: null,
};

type Shown = 'R' | 'late' | null;
interface Case {
  name: string;
  grade: CheckpointGradeDto;
  closed: boolean;
  /** What each reveal policy shows: R the engine's reveal, late the one passed for after the close. */
  reveal: (feedback: FeedbackPolicy) => Record<RevealPolicy, Shown>;
}

const none: Record<RevealPolicy, Shown> = { 'after-last-attempt': null, 'after-due': null, never: null };
const CASES: Case[] = [
  { name: 'a wrong answer with attempts left, open', grade: wrongWithAttemptsLeft, closed: false, reveal: () => none },
  {
    name: 'a right answer with attempts left, open',
    grade: rightWithAttemptsLeft,
    closed: false,
    // Only feedback shown ends the checkpoint on a right answer; hidden feedback must not give it away.
    reveal: (feedback) => (feedback === 'immediately' ? { 'after-last-attempt': 'R', 'after-due': null, never: null } : none),
  },
  {
    name: 'a wrong last attempt, open',
    grade: wrongOnLastAttempt,
    closed: false,
    reveal: () => ({ 'after-last-attempt': 'R', 'after-due': null, never: null }),
  },
  { name: 'an unreadable answer, open', grade: unreadable, closed: false, reveal: () => none },
  {
    name: 'a wrong answer with attempts left, after the close',
    grade: wrongWithAttemptsLeft,
    closed: true,
    reveal: () => ({ 'after-last-attempt': 'late', 'after-due': 'late', never: null }),
  },
  {
    name: 'a right answer, after the close',
    grade: rightWithAttemptsLeft,
    closed: true,
    reveal: () => ({ 'after-last-attempt': 'R', 'after-due': 'R', never: null }),
  },
  {
    name: 'a wrong last attempt, after the close',
    grade: wrongOnLastAttempt,
    closed: true,
    reveal: () => ({ 'after-last-attempt': 'R', 'after-due': 'R', never: null }),
  },
];

const hiddenFor = (feedback: FeedbackPolicy, closed: boolean) => feedback === 'never' || (feedback === 'after-due' && !closed);
const expectedReveal = (shown: Shown) => (shown === 'R' ? REVEAL : shown === 'late' ? AFTER_CLOSE : null);

describe('visibleGrade: every feedback × reveal policy', () => {
  for (const situation of CASES) {
    for (const feedback of FEEDBACK_POLICIES) {
      for (const reveal of REVEAL_POLICIES) {
        it(`${situation.name}: feedback ${feedback}, reveal ${reveal}`, () => {
          const { grade, feedbackHidden } = visibleGrade(situation.grade, {
            feedback,
            reveal,
            closed: situation.closed,
            revealText: AFTER_CLOSE,
          });
          expect(grade.reveal).toEqual(expectedReveal(situation.reveal(feedback)[reveal]));
          expect(grade.attemptsLeft).toBe(situation.grade.attemptsLeft);
          expect(grade.invalid).toBe(situation.grade.invalid);
          const hidden = hiddenFor(feedback, situation.closed);
          expect(feedbackHidden).toBe(hidden);
          if (!hidden) {
            expect({ ...grade, reveal: null }).toEqual({ ...situation.grade, reveal: null });
            return;
          }
          expect(grade).toMatchObject({ correct: null, score: 0, mistake: null, hints: [] });
          // Nothing of right/wrong leaks: no engine feedback, hint or mistake text.
          const text = JSON.stringify({ ...grade, reveal: null });
          for (const canary of ['CANARY-FEEDBACK', 'CANARY-RIGHT', 'CANARY-HINT', 'distractor']) expect(text).not.toContain(canary);
        });
      }
    }
  }
});

describe('visibleGrade: the saved reply', () => {
  it('says when feedback comes and that a new answer replaces this one', () => {
    const { grade } = visibleGrade(wrongWithAttemptsLeft, { feedback: 'after-due', reveal: 'after-due', closed: false });
    expect(grade.feedback).toBe(
      'Your answer is saved. You will see whether it was right after the lesson closes. You may change it: a new answer replaces this one.',
    );
  });

  it('says feedback is not shown under never, without the replace line once attempts are used up or after the close', () => {
    expect(visibleGrade(wrongOnLastAttempt, { feedback: 'never', reveal: 'never', closed: false }).grade.feedback).toBe(
      'Your answer is saved. Your teacher has chosen not to show whether answers are right.',
    );
    expect(visibleGrade(wrongWithAttemptsLeft, { feedback: 'never', reveal: 'never', closed: true }).grade.feedback).toBe(
      'Your answer is saved. Your teacher has chosen not to show whether answers are right.',
    );
  });

  it('keeps the reading problem of an unreadable answer (it says nothing about rightness) but drops its hints', () => {
    const { grade, feedbackHidden } = visibleGrade(unreadable, { feedback: 'never', reveal: 'after-last-attempt', closed: false });
    expect(feedbackHidden).toBe(true);
    expect(grade).toEqual({ ...unreadable, correct: null, hints: [] });
  });

  it('shows nothing after the close when no reveal was passed and the engine had none', () => {
    const { grade } = visibleGrade(wrongWithAttemptsLeft, { feedback: 'immediately', reveal: 'after-due', closed: true });
    expect(grade.reveal).toBeNull();
  });

  it('does not change the grade it was given', () => {
    const copy = structuredClone(rightWithAttemptsLeft);
    visibleGrade(rightWithAttemptsLeft, { feedback: 'never', reveal: 'never', closed: false });
    expect(rightWithAttemptsLeft).toEqual(copy);
  });
});
