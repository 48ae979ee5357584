import type { CheckpointGradeDto, PlaybackDto } from '@core/contracts';
import type { AnswerOutcome } from './use-lesson-player';

/** Fixtures shared by the player's component tests (invented demo data). */
export const testPlayback: PlaybackDto = {
  recordingId: '00000000-0000-4000-8000-000000000001',
  src: { url: '/media/demo.mp4', type: 'video/mp4' },
  posterUrl: null,
  expiresAt: '2099-01-01T00:00:00.000Z',
  durationSeconds: 60,
  width: 1280,
  height: 720,
  thumbnailsUrl: null,
  captions: [],
};

export const gradeOf = (over: Partial<CheckpointGradeDto>): CheckpointGradeDto => ({
  correct: false,
  score: 0,
  feedback: 'Not this one.',
  mistake: null,
  invalid: false,
  attemptsLeft: 1,
  hints: [],
  reveal: null,
  ...over,
});

/** A sender's reply: graded now, feedback shown. */
export const gradedOf = (over: Partial<CheckpointGradeDto>, feedbackHidden = false): AnswerOutcome => ({
  status: 'graded',
  grade: gradeOf(over),
  feedbackHidden,
});
