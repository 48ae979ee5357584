import type { LessonContent, LessonDto, LessonListDto, LessonSummaryDto, VersionSummaryDto } from '@core/contracts';
import { nextId } from '@/testing/mocks/data';

// Invented lessons of an obviously fictional school's physics demonstrations, for the web tests.

export function buildContent(
  overrides: Partial<LessonContent['settings']> = {},
  rest: Partial<Omit<LessonContent, 'settings'>> = {},
): LessonContent {
  return {
    settings: {
      title: 'Field of a flat coil (test)',
      description: 'We measure the field at the centre of a flat coil.',
      tags: ['magnetism', 'coils'],
      level: 'Year 10',
      safetyNotes: 'Keep the current **low**.',
      minSpacingMs: 500,
      ...overrides,
    },
    chapters: [],
    checkpoints: [],
    ...rest,
  };
}

export function buildLessonSummary(overrides: Partial<LessonSummaryDto> = {}): LessonSummaryDto {
  return {
    id: nextId(),
    title: 'Field of a flat coil (test)',
    tags: ['magnetism', 'coils'],
    level: 'Year 10',
    state: 'draft',
    owner: { id: nextId(), name: 'Ada Quill' },
    recording: { id: nextId(), title: 'Coil on a bench (test)', durationMs: 41_200, frameRate: 30, ready: true },
    shared: false,
    checkpointCount: 0,
    publishedVersion: null,
    unpublishedChanges: true,
    posterUrl: null,
    createdAt: '2025-03-03T09:00:00.000Z',
    updatedAt: '2025-03-04T10:00:00.000Z',
    ...overrides,
  };
}

export function buildLesson(overrides: Partial<LessonDto> = {}): LessonDto {
  const summary = buildLessonSummary(overrides);
  return {
    ...summary,
    revision: 4,
    draft: buildContent({ title: summary.title, tags: summary.tags, level: summary.level }),
    problems: [],
    savedAt: '2025-03-04T10:00:00.000Z',
    savedBy: summary.owner,
    canEdit: true,
    ...overrides,
  };
}

export function buildLessonList(lessons: LessonSummaryDto[], extra: Partial<LessonListDto> = {}): LessonListDto {
  return {
    lessons,
    tags: [...new Set(lessons.flatMap((lesson) => lesson.tags))].sort(),
    owners: lessons.flatMap((lesson) => (lesson.owner ? [lesson.owner] : [])),
    ...extra,
  };
}

export function buildVersion(overrides: Partial<VersionSummaryDto> = {}): VersionSummaryDto {
  return {
    id: nextId(),
    number: 1,
    note: '',
    publishedAt: '2025-03-05T14:30:00.000Z',
    publishedBy: { id: nextId(), name: 'Ada Quill' },
    checkpointCount: 2,
    changes: { added: [], removed: [], edited: [], chaptersChanged: false, settings: [] },
    ...overrides,
  };
}
