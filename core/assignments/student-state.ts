import type { AssignmentPhase } from '../contracts/assignments';
import type { StudentAssignmentState } from '../contracts/watch';

export interface StudentStateInput {
  phase: AssignmentPhase;
  /** The student has opened the watch page at least once. */
  opened: boolean;
  /** Recorded responses. */
  answered: number;
  watchedSeconds: number;
  /** The completion rule held at some point (completed_at set). */
  done: boolean;
}

/**
 * The state a student's home shows for one assignment: done wins; then upcoming before it opens,
 * closed after its close time, late while only late answers are taken; otherwise in progress once
 * the student opened, watched or answered anything, else not started.
 */
export function studentState(input: StudentStateInput): StudentAssignmentState {
  if (input.done) return 'done';
  if (input.phase === 'upcoming') return 'upcoming';
  if (input.phase === 'closed') return 'closed';
  if (input.phase === 'late') return 'late';
  return input.opened || input.answered > 0 || input.watchedSeconds > 0 ? 'in-progress' : 'not-started';
}
