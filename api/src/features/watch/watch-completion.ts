import { isAnswered, type CompletionDto, type LessonContent } from '@core/contracts';
import { completionOf, recordingSeconds } from '@core/assignments';
import type { AssignmentContext } from '../responses/assignment-context';

/** The answerable checkpoints the completion rule asks for. */
export function requiredKeys(content: LessonContent): string[] {
  return content.checkpoints.filter((c) => isAnswered(c) && c.required).map((c) => c.key);
}

/** The completion rule for one student: `answered` are the keys with a recorded response. */
export function completionFor(
  ctx: AssignmentContext,
  progress: { watchedSeconds: number; completedAt: Date | null } | undefined,
  answered: ReadonlySet<string>,
): CompletionDto {
  const required = requiredKeys(ctx.content);
  return completionOf({
    watchedSeconds: progress?.watchedSeconds ?? 0,
    totalSeconds: recordingSeconds(ctx.durationMs),
    requiredAnswered: required.filter((key) => answered.has(key)).length,
    requiredTotal: required.length,
    watchShareNeeded: ctx.completionWatchShare,
    completedAt: progress?.completedAt ?? null,
  });
}
