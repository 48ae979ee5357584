import type { LessonListQuery } from '@core/contracts';

export type LessonFilters = LessonListQuery;

/**
 * Query keys of lessons (TkDodo's key factory): a change to one lesson invalidates `lessonKeys.detail(id)`
 * (its versions hang below it) and `lessonKeys.lists()`.
 */
export const lessonKeys = {
  all: ['lessons'] as const,
  lists: () => [...lessonKeys.all, 'list'] as const,
  list: (filters: LessonFilters) => [...lessonKeys.lists(), filters] as const,
  details: () => [...lessonKeys.all, 'detail'] as const,
  detail: (lessonId: string) => [...lessonKeys.details(), lessonId] as const,
  versions: (lessonId: string) => [...lessonKeys.detail(lessonId), 'versions'] as const,
  version: (lessonId: string, number: number) => [...lessonKeys.versions(lessonId), number] as const,
};

/** `/api/lessons/<id>` with the id escaped. */
export const lessonUrl = (lessonId: string, rest = '') => `/api/lessons/${encodeURIComponent(lessonId)}${rest}`;
