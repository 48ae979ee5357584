import type { CompletionDto, ResponseResultDto, StudentCheckpoint, WatchViewDto } from '@core/contracts';
import { mcAt, viewOf } from '@/features/player/logic/test-view';
import { gradeOf, testPlayback } from '@/features/player/player-test-support';

/** Invented fixtures for the watch page's tests. */
export const ASSIGNMENT_ID = '00000000-0000-4000-8000-00000000a551';

export const completionOf = (over: Partial<CompletionDto> = {}): CompletionDto => ({
  watchedShare: 0,
  watchShareNeeded: 0.9,
  requiredAnswered: 0,
  requiredTotal: 1,
  done: false,
  completedAt: null,
  ...over,
});

export function watchViewOf(
  checkpoints: StudentCheckpoint[] = [mcAt('gate01', 5000, 'gate')],
  over: {
    safetyNotes?: string;
    progress?: Partial<WatchViewDto['progress']>;
    assignment?: Partial<WatchViewDto['assignment']>;
    serverTime?: string;
  } = {},
): WatchViewDto {
  return {
    assignment: {
      id: ASSIGNMENT_ID,
      className: 'Year 10 Physics (test)',
      dueAt: '2026-12-03T17:00:00.000Z',
      lateUntil: null,
      timeZone: 'Europe/London',
      feedback: 'immediately',
      reveal: 'after-last-attempt',
      state: 'in-progress',
      accepting: true,
      ...over.assignment,
    },
    view: viewOf(checkpoints, over.safetyNotes ?? ''),
    playback: testPlayback,
    book: {},
    progress: { safetyAcknowledged: false, resumeMs: 0, completion: completionOf(), ...over.progress },
    serverTime: over.serverTime ?? new Date().toISOString(),
  };
}

export function resultOf(over: Partial<ResponseResultDto> = {}): ResponseResultDto {
  return {
    responseId: '00000000-0000-4000-8000-00000000b001',
    attempt: 1,
    grade: gradeOf({ feedback: 'Look at the **needle** again.', hints: ['Use the right-hand rule.'] }),
    feedbackHidden: false,
    late: false,
    sentAfterReconnecting: false,
    recordedAt: new Date().toISOString(),
    serverTime: new Date().toISOString(),
    completion: completionOf({ requiredAnswered: 1 }),
    ...over,
  };
}
