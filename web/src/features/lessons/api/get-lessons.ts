import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { LessonListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonKeys, type LessonFilters } from './keys';

/** The lessons the caller may see, searched, filtered and sorted on the server; with the tags and owners to filter by. */
export const getLessons = (filters: LessonFilters) =>
  api.get('/api/lessons', LessonListDtoSchema, {
    q: filters.q?.trim() || undefined,
    tag: filters.tag,
    owner: filters.owner,
    state: filters.state,
    sort: filters.sort,
  });

export const lessonsQueryOptions = (filters: LessonFilters) =>
  queryOptions({
    queryKey: lessonKeys.list(filters),
    queryFn: () => getLessons(filters),
    // The old rows stay while the next filter's answer is on its way: the list does not flash empty.
    placeholderData: keepPreviousData,
  });

export const useLessons = (filters: LessonFilters) => useQuery(lessonsQueryOptions(filters));
