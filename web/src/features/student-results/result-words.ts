import type { ResultCheckpointDto, StudentResultsDto } from '@core/contracts';

type Assignment = StudentResultsDto['assignment'];
type Grade = NonNullable<ResultCheckpointDto['grade']>;

export type Verdict = 'right' | 'partly' | 'wrong' | 'saved';

/** Right, partly right (some of the points), not right, or saved without a mark (an unscored prediction). */
export function verdictOf(grade: Grade): Verdict {
  if (grade.correct === true) return 'right';
  if (grade.correct === false) return grade.score > 0 ? 'partly' : 'wrong';
  return 'saved';
}

export const VERDICT_WORDS: Record<Verdict, string> = {
  right: 'Right',
  partly: 'Partly right',
  wrong: 'Not right',
  saved: 'Saved (not marked)',
};

const points = (value: number) => String(Number(value.toFixed(2)));

/** "1 point", "2.5 points". */
export function pointsWorth(possible: number): string {
  return `${points(possible)} ${possible === 1 ? 'point' : 'points'}`;
}

/** "0.5 of 1 point", "2 of 3 points". */
export function pointsText(earned: number, possible: number): string {
  return `${points(earned)} of ${pointsWorth(possible)}`;
}

/** Answers are no longer accepted (after the close time, or the lesson is not open). */
const closedFor = (assignment: Assignment) => !assignment.accepting && assignment.state !== 'upcoming';

/** When right/wrong and marks appear, for a page whose marks are hidden; null when they show. */
export function feedbackNote(assignment: Assignment, closeText: string): string | null {
  switch (assignment.feedback) {
    case 'immediately':
      return null;
    case 'after-due':
      return closedFor(assignment) ? null : `Right or wrong, and your marks, are shown here after ${closeText}. Your answers are saved.`;
    case 'never':
      return 'Your teacher chose not to show right or wrong for this lesson. Your answers are saved and your teacher reads them.';
  }
}

/** When correct answers and explanations appear; null when nothing is left to wait for. */
export function revealNote(assignment: Assignment, closeText: string): string | null {
  switch (assignment.reveal) {
    case 'after-last-attempt':
      return closedFor(assignment) ? null : 'The answer to a question is shown once you can no longer answer it.';
    case 'after-due':
      return closedFor(assignment) ? null : `Answers and explanations are shown here after ${closeText}.`;
    case 'never':
      return 'Your teacher chose not to show the answers for this lesson.';
  }
}

/** Why an answered checkpoint has no reveal yet, in one line; null when the page-level note says it all. */
export function revealPendingLine(assignment: Assignment, closeText: string): string | null {
  if (closedFor(assignment)) return null;
  if (assignment.reveal === 'after-last-attempt') return 'The answer appears here once you can no longer answer this question.';
  if (assignment.reveal === 'after-due') return `The answer appears here after ${closeText}.`;
  return null;
}

/** The checkpoint's line when it has no answer. */
export function unansweredLine(assignment: Assignment, checkpoint: ResultCheckpointDto): string {
  if (closedFor(assignment)) return 'You did not answer this question.';
  return checkpoint.required ? 'Not answered yet. You need to answer this one to finish the lesson.' : 'Not answered yet (optional).';
}

/** Who gave the grade when it was not the first automatic mark. */
export function sourceLine(source: Grade['source']): string | null {
  if (source === 'teacher') return 'Marked by your teacher.';
  if (source === 'regrade') return 'Marked again after your teacher corrected the lesson.';
  return null;
}
