import { isAnswered, type Checkpoint, type CheckpointAnswer, type CheckpointGradeDto, type LessonContent } from '@core/contracts';
import { AnswerMismatchError, CheckpointNotGradableError, checkpointLabel } from '@core/lessons';
import { gradeAttempt } from '@core/lessons/grade-checkpoint';
import type { VariableValues } from '@core/physics/units/types';

/** A recorded response at a changed checkpoint, with the grade that counts for it now. */
export interface RegradeCandidate {
  responseId: string;
  studentId: string;
  checkpointKey: string;
  attempt: number;
  answer: CheckpointAnswer;
  rawText: string;
  /** The values the student was given at this checkpoint (numeric only). */
  values: VariableValues | null;
  latest: { score: number; correct: boolean | null; mistake: string | null; source: string } | null;
}

export interface RegradeChange {
  responseId: string;
  studentId: string;
  checkpointKey: string;
  grade: CheckpointGradeDto;
}

export interface RegradeOutcome {
  /** Responses graded again by the engine (a teacher's hand mark is kept, not regraded). */
  regraded: number;
  /** Those whose score, correctness or detected mistake changed: each gets a new `regrade` grade. */
  changes: RegradeChange[];
  /** Sentences for checkpoints whose recorded answers the new version can no longer read; the move is refused. */
  problems: string[];
}

const changed = (latest: RegradeCandidate['latest'], grade: CheckpointGradeDto) =>
  latest === null || latest.score !== grade.score || latest.correct !== grade.correct || latest.mistake !== grade.mistake;

/**
 * Grades recorded answers again against a corrected version: the same raw answer, attempt number
 * and stored values, seeded per assignment and student as the watch page drew them. A grade a
 * teacher gave by hand stands (it was a judgement on the answer, not the engine's result).
 */
export function regradeResponses(input: {
  assignmentId: string;
  locale: string;
  to: LessonContent;
  toVersion: number;
  candidates: RegradeCandidate[];
}): RegradeOutcome {
  const checkpoints = new Map<string, Checkpoint>(input.to.checkpoints.map((c) => [c.key, c]));
  const unreadable = new Map<string, { label: string; count: number; example: string; reason: string }>();
  const changes: RegradeChange[] = [];
  let regraded = 0;
  for (const candidate of input.candidates) {
    if (candidate.latest?.source === 'teacher') continue;
    const checkpoint = checkpoints.get(candidate.checkpointKey);
    if (!checkpoint || !isAnswered(checkpoint)) {
      const label = checkpoint ? checkpointLabel(checkpoint) : candidate.checkpointKey;
      note(unreadable, candidate, label, `version ${input.toVersion} has no question there`);
      continue;
    }
    let grade: CheckpointGradeDto;
    try {
      grade = gradeAttempt(checkpoint, candidate.answer, {
        seed: `${input.assignmentId}:${candidate.studentId}`,
        locale: input.locale,
        attempt: candidate.attempt,
        ...(candidate.values ? { values: candidate.values } : {}),
      }).grade;
    } catch (error) {
      if (!(error instanceof AnswerMismatchError || error instanceof CheckpointNotGradableError)) throw error;
      note(unreadable, candidate, checkpointLabel(checkpoint), error.message);
      continue;
    }
    if (grade.invalid) {
      note(unreadable, candidate, checkpointLabel(checkpoint), grade.feedback);
      continue;
    }
    regraded += 1;
    if (changed(candidate.latest, grade)) {
      changes.push({ responseId: candidate.responseId, studentId: candidate.studentId, checkpointKey: candidate.checkpointKey, grade });
    }
  }
  const problems = [...unreadable.values()].map(({ label, count, example, reason }) => {
    const answers = count === 1 ? 'A recorded answer' : `${count} recorded answers`;
    return `${answers} to “${label}” cannot be graded by version ${input.toVersion} (for example “${example}”: ${reason})`;
  });
  return { regraded, changes, problems };
}

function note(
  into: Map<string, { label: string; count: number; example: string; reason: string }>,
  candidate: RegradeCandidate,
  label: string,
  reason: string,
): void {
  const seen = into.get(candidate.checkpointKey);
  if (seen) seen.count += 1;
  else into.set(candidate.checkpointKey, { label, count: 1, example: candidate.rawText, reason: reason.replace(/\.$/, '') });
}
