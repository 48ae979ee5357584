import type { ResultCheckpointDto, StudentResultsDto } from '@core/contracts';
import { nextId } from '@/testing/mocks/data';

// Invented results of an obviously fictional school's lesson, for the web tests.

export function buildResultCheckpoint(overrides: Partial<ResultCheckpointDto> = {}): ResultCheckpointDto {
  return {
    key: `cp${nextId().slice(-8)}`,
    label: 'Field at the centre',
    kind: 'numeric',
    atMs: 12_000,
    prompt: 'What is the field at the centre of the coil (test)?',
    required: true,
    points: 1,
    attempts: [],
    grade: null,
    reveal: null,
    gradeUpdated: false,
    ...overrides,
  };
}

/** Open, due 3 Dec 2026 17:00 London time (GMT), feedback at once, answers revealed after the last attempt. */
export function buildStudentResults(overrides: Partial<StudentResultsDto> = {}): StudentResultsDto {
  return {
    assignment: {
      id: nextId(),
      className: 'Year 10 Physics (test)',
      dueAt: '2026-12-03T17:00:00.000Z',
      lateUntil: null,
      timeZone: 'Europe/London',
      feedback: 'immediately',
      reveal: 'after-last-attempt',
      state: 'in-progress',
      accepting: true,
      lessonTitle: 'Field of a flat coil (test)',
    },
    completion: {
      watchedShare: 0.5,
      watchShareNeeded: 0.9,
      requiredAnswered: 1,
      requiredTotal: 2,
      done: false,
      completedAt: null,
    },
    score: null,
    checkpoints: [],
    ...overrides,
  };
}
