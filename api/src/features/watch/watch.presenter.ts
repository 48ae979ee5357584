import type { CheckpointGradeDto, StudentAssignmentState, WatchRecord, WatchViewDto } from '@core/contracts';
import { revealFor, visibleGrade } from '@core/assignments';
import type { VariableValues } from '@core/physics/units/types';
import { studentSeed } from '../responses/drawn-values';
import type { AssignmentContext } from '../responses/assignment-context';
import type { Standing } from './watch-standing';
import { byCheckpoint, type StoredResponse } from './watch.read-model';

/** The assignment's facts the watch and results pages show (dates as instants, shown in `timeZone`). */
export function presentWatchAssignment(
  ctx: AssignmentContext,
  state: StudentAssignmentState,
  standing: Standing,
): WatchViewDto['assignment'] {
  return {
    id: ctx.id,
    className: ctx.className,
    dueAt: ctx.dueAt.toISOString(),
    lateUntil: ctx.lateUntil?.toISOString() ?? null,
    timeZone: ctx.timeZone,
    feedback: ctx.feedback,
    reveal: ctx.reveal,
    state,
    accepting: standing.accepting,
  };
}

/**
 * A stored grade as the policies let the student see it now. After the close a policy may show
 * the answer to a student whose grade had none (attempts left): it is stated from the checkpoint.
 */
export function gradeSeen(
  ctx: AssignmentContext,
  studentId: string,
  key: string,
  grade: CheckpointGradeDto,
  closed: boolean,
  values: VariableValues | undefined,
): { grade: CheckpointGradeDto; feedbackHidden: boolean } {
  const wantsStatedReveal = closed && ctx.reveal !== 'never' && grade.reveal === null;
  return visibleGrade(grade, {
    feedback: ctx.feedback,
    reveal: ctx.reveal,
    closed,
    revealText: wantsStatedReveal ? statedReveal(ctx, studentId, key, values) : undefined,
  });
}

/** The checkpoint's answer and explanation without a student's answer (for after the close). */
export function statedReveal(
  ctx: AssignmentContext,
  studentId: string,
  key: string,
  values: VariableValues | undefined,
): CheckpointGradeDto['reveal'] {
  const checkpoint = ctx.content.checkpoints.find((c) => c.key === key);
  if (!checkpoint) return null;
  return revealFor(checkpoint, { seed: studentSeed(ctx.id, studentId), locale: ctx.locale, values });
}

/**
 * What the player remembers of each answered checkpoint, from the stored answers: attempts used
 * (a prediction's explanation at its reveal uses none), the last answer and its latest grade as
 * the policies allow. Checkpoints not answered yet are absent.
 */
export function presentBook(
  ctx: AssignmentContext,
  studentId: string,
  responses: StoredResponse[],
  closed: boolean,
  drawn: Readonly<Record<string, VariableValues>>,
): Record<string, WatchRecord> {
  const book: Record<string, WatchRecord> = {};
  for (const [key, group] of byCheckpoint(responses)) {
    // Answers at a key a corrected version no longer has stay stored, but the player has nothing to show them on.
    if (!ctx.content.checkpoints.some((c) => c.key === key)) continue;
    const latest = group.at(-1)!;
    book[key] = {
      used: group.filter((r) => !r.isExplanation).length,
      answer: latest.answer,
      grade: latest.grade ? gradeSeen(ctx, studentId, key, latest.grade, closed, drawn[key]).grade : null,
    };
  }
  return book;
}
