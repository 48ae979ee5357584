import type { Knex } from 'knex';
import type { CompletionDto, ViewingReport } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { addCoverage, closesAt, countWatched, END_ALLOWANCE_MS, formatSchoolTime, intervalProblems } from '@core/assignments';
import { ConflictError, ValidationError } from '../../errors';
import type { AssignmentContext } from '../responses/assignment-context';
import { lockProgress, saveViewing, type ProgressKey } from './progress.repository';
import { completionFor } from './watch-completion';
import { listAnsweredKeys } from './watch.read-model';
import { standingOf } from './watch-standing';

const seconds = (ms: number) => `${(ms / 1000).toFixed(1)} s`;

/** Bad intervals or a resume point past the end: a 400 naming each. */
function reportProblems(report: ViewingReport, durationMs: number): { path: string; message: string }[] {
  const problems = intervalProblems(report.intervals, durationMs).map((message) => ({ path: 'intervals', message }));
  if (report.positionMs > durationMs + END_ALLOWANCE_MS) {
    const message = `The position ${seconds(report.positionMs)} is after the recording's end (${seconds(durationMs)}).`;
    problems.push({ path: 'positionMs', message });
  }
  return problems;
}

/**
 * Viewing is taken from the opening on. A page closed just after the close time still reports what
 * was watched before it (keepalive fetch, beacon), so reports are taken for a day past the close,
 * like answers queued offline; later ones are refused.
 */
function requireViewingOpen(ctx: AssignmentContext, now: Date): void {
  const when = (instant: Date) => formatSchoolTime(instant, ctx.timeZone, ctx.locale);
  if (standingOf(ctx, now).phase === 'upcoming') {
    throw new ConflictError('assignment_not_open', `“${ctx.lessonTitle}” opens on ${when(ctx.opensAt)}; nothing of it can be watched yet.`);
  }
  if (now.getTime() > closesAt(ctx).getTime() + LIMITS.offlineGraceMs) {
    throw new ConflictError('assignment_closed', `“${ctx.lessonTitle}” closed on ${when(closesAt(ctx))}; viewing is no longer recorded.`);
  }
}

/**
 * Merges a viewing report into the student's per-second coverage under the progress row's lock
 * (two tabs' reports never overwrite each other), keeps the resume point and sets `completed_at`
 * the first time the completion rule holds. Returns the completion after the merge.
 */
export async function recordViewing(
  db: Knex,
  ctx: AssignmentContext,
  key: ProgressKey,
  report: ViewingReport,
  now: Date,
): Promise<CompletionDto> {
  requireViewingOpen(ctx, now);
  const problems = reportProblems(report, ctx.durationMs);
  if (problems.length > 0) {
    throw new ValidationError(problems.map((p) => p.message).join(' '), problems, 'invalid_viewing');
  }
  return db.transaction(async (trx) => {
    const row = await lockProgress(trx, key);
    const coverage = addCoverage(row.coverage, report.intervals, ctx.durationMs);
    const watchedSeconds = countWatched(coverage);
    const answered = (await listAnsweredKeys(trx, key.schoolId, key.studentId, [key.assignmentId])).get(key.assignmentId) ?? new Set();
    const completion = completionFor(ctx, { watchedSeconds, completedAt: row.completedAt }, answered);
    const completedAt = completion.done && row.completedAt === null ? now : null;
    await saveViewing(trx, key, {
      coverage,
      watchedSeconds,
      positionMs: Math.min(report.positionMs, ctx.durationMs),
      viewedAt: now,
      completedAt,
    });
    return completedAt ? { ...completion, completedAt: completedAt.toISOString() } : completion;
  });
}
