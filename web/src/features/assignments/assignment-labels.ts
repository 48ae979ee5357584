import type { AssignmentPhase, FeedbackPolicy, RevealPolicy } from '@core/contracts';
import { sharePercentText } from './form-values';

/** What each feedback policy means for a student, in one line. */
export const FEEDBACK_POLICY_HINTS: Record<FeedbackPolicy, string> = {
  immediately: 'Students see right or wrong, your feedback and hints as soon as they answer, and can try again while attempts remain.',
  'after-due':
    'Until the assignment closes, students only see that each answer is saved (no hints); right or wrong appears once it closes.',
  never: 'Students only see that each answer is saved, never right or wrong; you still see every grade.',
};

/** What each reveal policy means for a student, in one line. */
export const REVEAL_POLICY_HINTS: Record<RevealPolicy, string> = {
  'after-last-attempt':
    'A checkpoint’s correct answer and explanation appear once the student can no longer answer it: attempts used up, or right with feedback shown.',
  'after-due': 'Correct answers and explanations appear for everyone once the assignment closes.',
  never: 'Students never see the correct answers or explanations.',
};

export const PHASE_LABELS: Record<AssignmentPhase, string> = {
  upcoming: 'Not open yet',
  open: 'Open',
  late: 'Taking late answers',
  closed: 'Closed',
};

/** "90 %" from 0.9 (whole percents, or one decimal when needed). */
export function percentText(share: number): string {
  // A no-break space: the number and its sign stay on one line.
  return `${sharePercentText(share)}\u00a0%`;
}
