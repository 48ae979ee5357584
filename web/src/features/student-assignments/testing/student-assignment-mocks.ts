import type { CompletionDto, StudentAssignmentDto, StudentHomeDto } from '@core/contracts';
import { nextId } from '@/testing/mocks/data';

// Invented assignments of an obviously fictional school, for the web tests.

export function buildCompletion(overrides: Partial<CompletionDto> = {}): CompletionDto {
  return {
    watchedShare: 0,
    watchShareNeeded: 0.9,
    requiredAnswered: 0,
    requiredTotal: 3,
    done: false,
    completedAt: null,
    ...overrides,
  };
}

/** Open from 30 Nov 2026 09:00 to 3 Dec 2026 17:00 London time (GMT then, so the instants read the same in UTC). */
export function buildStudentAssignment(overrides: Partial<StudentAssignmentDto> = {}): StudentAssignmentDto {
  return {
    id: nextId(),
    lessonTitle: 'Field of a flat coil (test)',
    className: 'Year 10 Physics (test)',
    teacherName: 'Ada Quill',
    opensAt: '2026-11-30T09:00:00.000Z',
    dueAt: '2026-12-03T17:00:00.000Z',
    lateUntil: null,
    timeZone: 'Europe/London',
    state: 'not-started',
    completion: buildCompletion(),
    isNew: false,
    gradeUpdated: false,
    posterUrl: null,
    ...overrides,
  };
}

export function buildStudentHome(assignments: StudentAssignmentDto[], serverTime = '2026-12-01T10:00:00.000Z'): StudentHomeDto {
  return { assignments, serverTime };
}
