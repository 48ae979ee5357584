import {
  isAnswered,
  type AnsweredCheckpoint,
  type CompletionDto,
  type ResultCheckpointDto,
  type StudentAssignmentState,
  type StudentResultsDto,
} from '@core/contracts';
import { answerText, feedbackShown } from '@core/assignments';
import { checkpointLabel, toStudentView } from '@core/lessons';
import type { VariableValues } from '@core/physics/units/types';
import { studentSeed } from '../responses/drawn-values';
import type { AssignmentContext } from '../responses/assignment-context';
import type { Standing } from './watch-standing';
import { gradeSeen, presentWatchAssignment, statedReveal } from './watch.presenter';
import { byCheckpoint, type StoredResponse } from './watch.read-model';

export interface ResultsInput {
  ctx: AssignmentContext;
  studentId: string;
  standing: Standing;
  state: StudentAssignmentState;
  completion: CompletionDto;
  responses: StoredResponse[];
  drawn: Readonly<Record<string, VariableValues>>;
  /** The student's previous visit to this page: newer regrades and hand marks are "updated". */
  seenBefore: Date | null;
}

/** A checkpoint that earns points: every answerable kind but an unscored prediction. */
const scored = (checkpoint: AnsweredCheckpoint) => checkpoint.kind !== 'prediction' || checkpoint.scored;

function checkpointResult(
  input: ResultsInput,
  checkpoint: AnsweredCheckpoint,
  prompt: string,
  group: StoredResponse[],
): ResultCheckpointDto {
  const { ctx, studentId, standing, drawn, seenBefore } = input;
  const counted = group.filter((r) => !r.isExplanation);
  const latest = counted.at(-1) ?? group.at(-1);
  const seen = latest?.grade ? gradeSeen(ctx, studentId, checkpoint.key, latest.grade, standing.closed, drawn[checkpoint.key]) : null;
  // Never answered: the answer is shown only once no answer can be made (after the close), if the policy shows it then.
  const reveal = seen
    ? seen.grade.reveal
    : standing.closed && ctx.reveal !== 'never'
      ? statedReveal(ctx, studentId, checkpoint.key, drawn[checkpoint.key])
      : null;
  return {
    key: checkpoint.key,
    label: checkpointLabel({ ...checkpoint, prompt }),
    kind: checkpoint.kind,
    atMs: checkpoint.atMs,
    prompt,
    required: checkpoint.required,
    points: checkpoint.points,
    attempts: group.map((r) => ({
      attempt: r.attempt,
      answerText: answerText(checkpoint, r.answer),
      recordedAt: r.receivedAt.toISOString(),
      late: r.late,
      sentAfterReconnecting: r.sentAfterReconnecting,
    })),
    grade:
      seen && latest && !seen.feedbackHidden
        ? { correct: seen.grade.correct, score: seen.grade.score, feedback: seen.grade.feedback, source: latest.gradeSource ?? 'engine' }
        : null,
    reveal,
    gradeUpdated: group.some(
      (r) =>
        r.gradeSource !== null && r.gradeSource !== 'engine' && r.gradedAt !== null && (seenBefore === null || r.gradedAt > seenBefore),
    ),
  };
}

/**
 * The student's own results: per answerable checkpoint (in time order) their answers, the latest
 * grade when the feedback policy shows it, the answer and explanation when the reveal policy does,
 * and the points earned once feedback is shown.
 */
export function presentResults(input: ResultsInput): StudentResultsDto {
  const { ctx, studentId, standing, state, completion, responses, drawn } = input;
  const groups = byCheckpoint(responses);
  // Prompts as the student read them: their own numbers in place of {{placeholders}}.
  const view = toStudentView(ctx.content, { seed: studentSeed(ctx.id, studentId), locale: ctx.locale, drawn });
  const byKey = new Map(ctx.content.checkpoints.map((c) => [c.key, c]));
  const checkpoints: ResultCheckpointDto[] = [];
  let earned = 0;
  let possible = 0;
  for (const shown of view.checkpoints) {
    const checkpoint = byKey.get(shown.key);
    if (!checkpoint || !isAnswered(checkpoint) || !('prompt' in shown)) continue;
    const result = checkpointResult(input, checkpoint, shown.prompt, groups.get(checkpoint.key) ?? []);
    checkpoints.push(result);
    if (scored(checkpoint)) {
      possible += checkpoint.points;
      earned += checkpoint.points * (result.grade?.score ?? 0);
    }
  }
  return {
    assignment: { ...presentWatchAssignment(ctx, state, standing), lessonTitle: ctx.lessonTitle },
    completion,
    score: feedbackShown(ctx.feedback, standing.closed) ? { earned, possible } : null,
    checkpoints,
  };
}
