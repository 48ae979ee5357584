import { randomUUID } from 'node:crypto';
import type {
  AnsweredCheckpoint,
  CheckpointAnswer,
  CheckpointGradeDto,
  CompletionDto,
  ResponseResultDto,
  ResponseSubmit,
} from '@core/contracts';
import { acceptAnswer, answerText, effectiveAnswerTime, feedbackShown, isClosed, revealFor, visibleGrade } from '@core/assignments';
import { AnswerMismatchError, CheckpointNotGradableError, gradeAttempt } from '@core/lessons/grade-checkpoint';
import { checkpointLabel } from '@core/lessons/checkpoint-label';
import type { VariableValues } from '@core/physics/units/types';
import { AppError, ConflictError, NotFoundError } from '../../errors';
import { completionFor } from '../watch/watch-completion';
import type { AssignmentContext } from './assignment-context';
import { studentSeed } from './drawn-values';
import type { Settled } from './group-commit';
import { pairKey, type LockedProgress, type NewResponse, type StoredRepeat, type SubmitState } from './responses.repository';

/** One answer on its way to the database, checked and hashed by the service. */
export interface Submission {
  ctx: AssignmentContext;
  studentId: string;
  checkpoint: AnsweredCheckpoint;
  input: ResponseSubmit;
  /** SHA-256 of the request body without its key: the same key with another body is refused. */
  requestHash: string;
  receivedAt: Date;
  /** This student's stored values at a numeric checkpoint. */
  values: VariableValues | undefined;
}

/** 201 for a new record; 200 for a stored result sent again or an answer that could not be read (not recorded). */
export interface SubmitOutcome {
  status: 200 | 201;
  result: Omit<ResponseResultDto, 'serverTime'>;
}

export interface BatchPlan {
  results: Settled<SubmitOutcome>[];
  inserts: NewResponse[];
  completed: { assignmentId: string; studentId: string; at: Date }[];
}

interface CheckpointTally {
  used: number;
  lastAttempt: number;
  lastAnswer: CheckpointAnswer | null;
  lastCorrect: boolean | null;
}

interface PairTally {
  progress: LockedProgress | undefined;
  answered: Set<string>;
  completedAt: Date | null;
}

const refusal = (error: unknown): Settled<SubmitOutcome> => ({ ok: false, error });
const idempotencyConflict = () =>
  new ConflictError(
    'idempotency_conflict',
    'This answer carries the key of a different answer already saved. Reload the page: the saved answer is kept.',
  );

/** The prediction sent again at its reveal with the student's explanation: recorded, not counted as an attempt. */
function isExplanation(checkpoint: AnsweredCheckpoint, answer: CheckpointAnswer, last: CheckpointAnswer | null): boolean {
  if (checkpoint.kind !== 'prediction' || !checkpoint.askExplanation || answer.kind !== 'prediction' || last?.kind !== 'prediction')
    return false;
  const explained = (answer.explanation ?? '').trim() !== '';
  return explained && last.optionId === answer.optionId && (last.text ?? '') === (answer.text ?? '');
}

function shownGrade(item: Submission, grade: CheckpointGradeDto, now: Date): { grade: CheckpointGradeDto; feedbackHidden: boolean } {
  const { ctx, checkpoint } = item;
  const closed = isClosed(ctx, now);
  // After the close a policy may reveal to a student who still had attempts: the engine's grade has no reveal then.
  const revealText = closed
    ? revealFor(checkpoint, {
        seed: studentSeed(ctx.id, item.studentId),
        locale: ctx.locale,
        ...(item.values ? { values: item.values } : {}),
      })
    : undefined;
  return visibleGrade(grade, { feedback: ctx.feedback, reveal: ctx.reveal, closed, ...(revealText ? { revealText } : {}) });
}

function repeatOutcome(item: Submission, stored: StoredRepeat, completion: CompletionDto, now: Date): SubmitOutcome {
  const { grade, feedbackHidden } = shownGrade(item, stored.detail, now);
  return {
    status: 200,
    result: {
      responseId: stored.id,
      attempt: stored.attempt,
      grade,
      feedbackHidden,
      late: stored.late,
      sentAfterReconnecting: stored.sentAfterReconnecting,
      recordedAt: stored.receivedAt.toISOString(),
      completion,
    },
  };
}

function gradeOrRefuse(item: Submission, attempt: number): Settled<ReturnType<typeof gradeAttempt>> {
  try {
    const options = { seed: studentSeed(item.ctx.id, item.studentId), locale: item.ctx.locale, attempt };
    return {
      ok: true,
      value: gradeAttempt(item.checkpoint, item.input.answer, item.values ? { ...options, values: item.values } : options),
    };
  } catch (error) {
    if (error instanceof AnswerMismatchError) return { ok: false, error: new AppError(400, 'answer_mismatch', error.message) };
    if (error instanceof CheckpointNotGradableError)
      return { ok: false, error: new ConflictError('checkpoint_not_gradable', error.message) };
    return { ok: false, error };
  }
}

/**
 * Decides every submission of one batch, in arrival order, from the state read under the progress
 * locks: a stored key is answered with its stored result (or 409 for another body), then the
 * enrolment, the dates, the attempts left; the engine grades the rest. Answers it could not read are
 * returned and not recorded. Pure: the caller writes `inserts` and `completed`, then commits.
 */
export function planBatch(items: Submission[], locked: Map<string, LockedProgress>, states: SubmitState[], now: Date): BatchPlan {
  const plan: BatchPlan = { results: [], inserts: [], completed: [] };
  const pairs = new Map<string, PairTally>();
  const tallies = new Map<string, CheckpointTally>();
  const keysInBatch = new Map<string, { hash: string; outcome: Settled<SubmitOutcome> }>();

  items.forEach((item, index) => {
    const state = states[index]!;
    const { ctx, checkpoint, input, studentId } = item;
    const pk = pairKey(ctx.id, studentId);
    let pair = pairs.get(pk);
    if (!pair) {
      const progress = locked.get(pk);
      pair = { progress, answered: new Set(state.answeredKeys), completedAt: progress?.completedAt ?? null };
      pairs.set(pk, pair);
    }
    const tallyKey = `${pk}:${checkpoint.key}`;
    let tally = tallies.get(tallyKey);
    if (!tally) {
      tally = { used: state.used, lastAttempt: state.lastAttempt, lastAnswer: state.lastAnswer, lastCorrect: state.lastCorrect };
      tallies.set(tallyKey, tally);
    }
    const completion = () =>
      completionFor(
        ctx,
        pair.progress ? { watchedSeconds: pair.progress.watchedSeconds, completedAt: pair.completedAt } : undefined,
        pair.answered,
      );

    const idem = `${studentId}:${input.idempotencyKey}`;
    const earlier = keysInBatch.get(idem);
    if (earlier) {
      // Two tabs sent the same answer into one batch: the second gets what the first got.
      if (earlier.hash !== item.requestHash) plan.results.push(refusal(idempotencyConflict()));
      else if (earlier.outcome.ok) plan.results.push({ ok: true, value: { ...earlier.outcome.value, status: 200 } });
      else plan.results.push(earlier.outcome);
      return;
    }
    const settle = (outcome: Settled<SubmitOutcome>) => {
      keysInBatch.set(idem, { hash: item.requestHash, outcome });
      plan.results.push(outcome);
    };

    if (state.repeat) {
      settle(
        state.repeat.requestHash === item.requestHash
          ? { ok: true, value: repeatOutcome(item, state.repeat, completion(), now) }
          : refusal(idempotencyConflict()),
      );
      return;
    }
    if (!pair.progress) {
      settle(refusal(new NotFoundError('That assignment (it may not be assigned to your class)')));
      return;
    }
    const answeredAt = new Date(input.answeredAt);
    const acceptance = acceptAnswer(ctx, answeredAt, item.receivedAt, ctx.timeZone, ctx.locale);
    if (!acceptance.ok) {
      settle(refusal(new ConflictError(acceptance.code === 'not_open' ? 'assignment_not_open' : 'assignment_closed', acceptance.message)));
      return;
    }
    // An answer kept offline over the close is taken on trust, unless the student has since opened
    // their results, which may show the answers after the close.
    if (acceptance.sentAfterReconnecting && pair.progress.resultsSeenAt && isClosed(ctx, pair.progress.resultsSeenAt)) {
      settle(
        refusal(
          new ConflictError(
            'assignment_closed',
            'This answer reached the server after the lesson closed and after you opened your results, which can show the answers, so it was not saved.',
          ),
        ),
      );
      return;
    }
    const label = checkpointLabel(checkpoint);
    const explanation = isExplanation(checkpoint, input.answer, tally.lastAnswer);
    if (!explanation) {
      if (tally.used >= checkpoint.attempts) {
        const times = checkpoint.attempts === 1 ? 'your one attempt' : `all ${checkpoint.attempts} attempts`;
        settle(refusal(new ConflictError('no_attempts_left', `You have used ${times} at “${label}”, so this answer was not saved.`)));
        return;
      }
      if (tally.lastCorrect === true && feedbackShown(ctx.feedback, isClosed(ctx, now))) {
        settle(
          refusal(new ConflictError('no_attempts_left', `You already answered “${label}” correctly, so there is nothing more to send.`)),
        );
        return;
      }
    }
    const graded = gradeOrRefuse(item, explanation ? Math.max(1, tally.used) : tally.used + 1);
    if (!graded.ok) {
      settle(graded);
      return;
    }
    const { grade, parsedSi } = graded.value;
    const shown = shownGrade(item, grade, now);
    const common = {
      grade: shown.grade,
      feedbackHidden: shown.feedbackHidden,
      late: acceptance.late,
      sentAfterReconnecting: acceptance.sentAfterReconnecting,
    };
    if (grade.invalid) {
      // The engine could not read it (unknown unit, wrong dimension, empty): said so, nothing used up.
      settle({
        ok: true,
        value: { status: 200, result: { ...common, responseId: null, attempt: null, recordedAt: null, completion: completion() } },
      });
      return;
    }
    const attempt = tally.lastAttempt + 1;
    const id = randomUUID();
    plan.inserts.push({
      id,
      schoolId: ctx.schoolId,
      assignmentId: ctx.id,
      studentId,
      checkpointKey: checkpoint.key,
      versionNumber: ctx.versionNumber,
      attempt,
      idempotencyKey: input.idempotencyKey,
      requestHash: item.requestHash,
      answer: input.answer,
      rawText: answerText(checkpoint, input.answer),
      parsedSi,
      variables: checkpoint.kind === 'numeric' ? (item.values ?? null) : null,
      isExplanation: explanation,
      answeredAt: effectiveAnswerTime(answeredAt, item.receivedAt),
      receivedAt: item.receivedAt,
      late: acceptance.late,
      sentAfterReconnecting: acceptance.sentAfterReconnecting,
      grade,
    });
    tally.lastAttempt = attempt;
    if (!explanation) tally.used += 1;
    tally.lastAnswer = input.answer;
    tally.lastCorrect = grade.correct;
    pair.answered.add(checkpoint.key);
    let done = completion();
    if (done.done && pair.completedAt === null) {
      pair.completedAt = now;
      plan.completed.push({ assignmentId: ctx.id, studentId, at: now });
      done = completion();
    }
    settle({
      ok: true,
      value: { status: 201, result: { ...common, responseId: id, attempt, recordedAt: item.receivedAt.toISOString(), completion: done } },
    });
  });
  return plan;
}
