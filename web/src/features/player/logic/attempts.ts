import type { CheckpointAnswer, CheckpointGradeDto } from '@core/contracts';

/** What the player remembers of one checkpoint: only what the server's grade replies said. */
export type AttemptRecord = {
  /** Attempts used: an answer the server could not read (`invalid`) does not use one. */
  used: number;
  /** The last answer the server could read (a prediction's reveal shows it). */
  answer: CheckpointAnswer | null;
  grade: CheckpointGradeDto | null;
};
export type AttemptBook = Readonly<Record<string, AttemptRecord>>;

const EMPTY: AttemptRecord = { used: 0, answer: null, grade: null };

export function recordOf(book: AttemptBook, key: string): AttemptRecord {
  return book[key] ?? EMPTY;
}

/** The attempt number the next answer is sent with. */
export function nextAttempt(book: AttemptBook, key: string): number {
  return recordOf(book, key).used + 1;
}

/** The book after the server graded `attempt`. */
export function recordGrade(
  book: AttemptBook,
  key: string,
  attempt: number,
  answer: CheckpointAnswer,
  grade: CheckpointGradeDto,
): AttemptBook {
  const before = recordOf(book, key);
  if (grade.invalid) return { ...book, [key]: { ...before, grade } };
  return { ...book, [key]: { used: Math.max(before.used, attempt), answer, grade } };
}

/** At least one answer the server could read. */
export function hasAnswered(record: AttemptRecord): boolean {
  return record.used > 0;
}

/** Another try is allowed: the last answer was read, was not right, and attempts remain. */
export function canTryAgain(record: AttemptRecord): boolean {
  const grade = record.grade;
  if (!grade || grade.invalid || !hasAnswered(record)) return false;
  return grade.correct !== true && grade.attemptsLeft > 0;
}

/** Nothing more to answer: right, or no attempts left. */
export function isFinished(record: AttemptRecord): boolean {
  const grade = record.grade;
  if (!grade || !hasAnswered(record) || grade.invalid) return false;
  return grade.correct === true || grade.attemptsLeft <= 0;
}
