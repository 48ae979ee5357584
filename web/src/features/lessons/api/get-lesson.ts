import { queryOptions, useQuery } from '@tanstack/react-query';
import { LessonDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonKeys, lessonUrl } from './keys';

/** One lesson with its whole draft, its problems and whether the caller may edit it. */
export const getLesson = (lessonId: string) => api.get(lessonUrl(lessonId), LessonDtoSchema);

export const lessonQueryOptions = (lessonId: string) =>
  queryOptions({ queryKey: lessonKeys.detail(lessonId), queryFn: () => getLesson(lessonId) });

export const useLesson = (lessonId: string) => useQuery(lessonQueryOptions(lessonId));
