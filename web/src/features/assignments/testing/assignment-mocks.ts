import type { AssignmentDto } from '@core/contracts';
import { nextId } from '@/testing/mocks/data';

// Invented assignments of an obviously fictional school, for the web tests.

export function buildAssignment(overrides: Partial<AssignmentDto> = {}): AssignmentDto {
  return {
    id: nextId(),
    lesson: { id: nextId(), title: 'Field of a flat coil (test)', latestVersion: 1 },
    versionNumber: 1,
    class: { id: nextId(), name: 'Year 10 Physics (test)' },
    // 09:00 and 17:00 in Europe/London (GMT in December).
    opensAt: '2026-12-01T09:00:00.000Z',
    dueAt: '2026-12-03T17:00:00.000Z',
    lateUntil: null,
    timeZone: 'Europe/London',
    feedback: 'immediately',
    reveal: 'after-last-attempt',
    completionWatchShare: 0.9,
    createdBy: { id: nextId(), name: 'Ada Quill' },
    createdAt: '2026-11-30T10:00:00.000Z',
    phase: 'open',
    counts: { students: 6, started: 2, done: 1 },
    canManage: true,
    ...overrides,
  };
}
