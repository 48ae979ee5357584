import type { AssignmentPhase } from '@core/contracts';
import { assignmentPhase, closesAt, formatSchoolTime, isClosed } from '@core/assignments';
import { ConflictError } from '../../errors';
import type { AssignmentContext } from '../responses/assignment-context';

/** Where an assignment stands for its students at one moment on the server's clock. */
export interface Standing {
  phase: AssignmentPhase;
  /** Past the close time (lateUntil, else the due time): no answer made now is taken. */
  closed: boolean;
  /** Answers are taken now: open, or late with late answers accepted. */
  accepting: boolean;
}

export function standingOf(ctx: AssignmentContext, now: Date): Standing {
  const phase = assignmentPhase(ctx, now);
  return { phase, closed: isClosed(ctx, now), accepting: phase === 'open' || phase === 'late' };
}

/**
 * The recording is played only while the assignment takes answers: before it opens the refusal
 * says when it opens; after the close it points to the results page, which stays readable.
 */
export function requireAccepting(ctx: AssignmentContext, now: Date): Standing {
  const standing = standingOf(ctx, now);
  const when = (instant: Date) => formatSchoolTime(instant, ctx.timeZone, ctx.locale);
  if (standing.phase === 'upcoming') {
    throw new ConflictError('assignment_not_open', `“${ctx.lessonTitle}” opens on ${when(ctx.opensAt)}. You can watch it from then.`);
  }
  if (!standing.accepting) {
    throw new ConflictError(
      'assignment_closed',
      `“${ctx.lessonTitle}” closed on ${when(closesAt(ctx))}, so it cannot be watched any more. Your answers and results are on its results page.`,
    );
  }
  return standing;
}
