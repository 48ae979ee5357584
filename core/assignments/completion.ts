import type { CompletionDto } from '../contracts/watch';

export interface CompletionInput {
  watchedSeconds: number;
  totalSeconds: number;
  requiredAnswered: number;
  requiredTotal: number;
  /** 0 to 1: the assignment's completion_watch_share. */
  watchShareNeeded: number;
  /** Set the first time the rule held; once done, always done. */
  completedAt: Date | null;
}

/** Enough seconds watched: at least the share, with rounding slack so 0.7 × 10 asks for 7, not 8. */
function watchedEnough(watched: number, total: number, share: number): boolean {
  return watched >= Math.ceil(share * total - 1e-9);
}

/**
 * Where a student stands against the completion rule: every required answerable checkpoint has a
 * recorded response and at least the needed share of the recording's seconds was watched. Once
 * `completedAt` is set the student stays done (the caller sets it the first time `done` is true).
 */
export function completionOf(input: CompletionInput): CompletionDto {
  const { watchedSeconds, totalSeconds, requiredAnswered, requiredTotal, watchShareNeeded, completedAt } = input;
  const watchedShare = totalSeconds > 0 ? Math.min(1, Math.max(0, watchedSeconds) / totalSeconds) : 1;
  const ruleHolds =
    requiredAnswered >= requiredTotal && watchedEnough(Math.min(watchedSeconds, totalSeconds), totalSeconds, watchShareNeeded);
  return {
    watchedShare,
    watchShareNeeded,
    requiredAnswered,
    requiredTotal,
    done: completedAt !== null || ruleHolds,
    completedAt: completedAt === null ? null : completedAt.toISOString(),
  };
}
