import type { CheckpointAnswer, CheckpointGradeDto } from '@core/contracts';

/** An answer kept on this device (the connection failed): it counts as given, its grade comes later. */
export type PendingAnswer = { attempt: number; answer: CheckpointAnswer };

/** What the player remembers of one checkpoint: only what the server's grade replies said. */
export type AttemptRecord = {
  /** Attempts used: an answer the server could not read (`invalid`) does not use one. */
  used: number;
  /** The last answer the server could read (a prediction's reveal shows it). */
  answer: CheckpointAnswer | null;
  grade: CheckpointGradeDto | null;
  /** Answers waiting to be sent, oldest first (the watch page's durable queue). */
  pending?: readonly PendingAnswer[];
  /** The feedback policy hides right/wrong: the last grade only says the answer was saved. */
  feedbackHidden?: boolean;
};
export type AttemptBook = Readonly<Record<string, AttemptRecord>>;

const EMPTY: AttemptRecord = { used: 0, answer: null, grade: null };
const NONE: readonly PendingAnswer[] = [];

export function recordOf(book: AttemptBook, key: string): AttemptRecord {
  return book[key] ?? EMPTY;
}

export function pendingOf(record: AttemptRecord): readonly PendingAnswer[] {
  return record.pending ?? NONE;
}

/** Waiting for a grade that comes once the connection returns. */
export function isPending(record: AttemptRecord): boolean {
  return pendingOf(record).length > 0;
}

/** The newest answer given, sent or waiting (the prediction a reveal shows beside what happened). */
export function latestAnswer(record: AttemptRecord): CheckpointAnswer | null {
  return pendingOf(record).at(-1)?.answer ?? record.answer;
}

/** The attempt number the next answer is sent with. */
export function nextAttempt(book: AttemptBook, key: string): number {
  const record = recordOf(book, key);
  return record.used + pendingOf(record).length + 1;
}

/** The book after the server graded `attempt` (sent now, or from the queue later). */
export function recordGrade(
  book: AttemptBook,
  key: string,
  attempt: number,
  answer: CheckpointAnswer,
  grade: CheckpointGradeDto,
  feedbackHidden = false,
): AttemptBook {
  const before = recordOf(book, key);
  const pending = pendingOf(before).filter((p) => p.attempt !== attempt);
  if (grade.invalid) return { ...book, [key]: { ...before, grade, pending } };
  return { ...book, [key]: { used: Math.max(before.used, attempt), answer, grade, pending, feedbackHidden } };
}

/** The book after an answer was kept on this device to be sent later. */
export function recordQueued(book: AttemptBook, key: string, attempt: number, answer: CheckpointAnswer): AttemptBook {
  const before = recordOf(book, key);
  return { ...book, [key]: { ...before, pending: [...pendingOf(before), { attempt, answer }] } };
}

/** The book after the server refused a queued answer for good (it was not recorded). */
export function recordRefused(book: AttemptBook, key: string, attempt: number): AttemptBook {
  const before = recordOf(book, key);
  return { ...book, [key]: { ...before, pending: pendingOf(before).filter((p) => p.attempt !== attempt) } };
}

/** At least one answer the server could read, or one waiting to be sent (a gate opens once its answer is queued). */
export function hasAnswered(record: AttemptRecord): boolean {
  return record.used > 0 || isPending(record);
}

/** Another try is allowed: the last answer was read, was not right, attempts remain, and nothing waits to be sent. */
export function canTryAgain(record: AttemptRecord): boolean {
  const grade = record.grade;
  if (!grade || grade.invalid || record.used === 0 || isPending(record)) return false;
  return grade.correct !== true && grade.attemptsLeft > 0;
}

/** Nothing more to answer: right, or no attempts left. */
export function isFinished(record: AttemptRecord): boolean {
  const grade = record.grade;
  if (!grade || record.used === 0 || grade.invalid || isPending(record)) return false;
  return grade.correct === true || grade.attemptsLeft <= 0;
}

/** With feedback hidden a new attempt replaces the saved answer; otherwise it is another try. */
export function tryAgainLabel(record: AttemptRecord): string {
  return record.feedbackHidden ? 'Change my answer' : 'Try again';
}
