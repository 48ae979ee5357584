import { queryOptions, useQuery } from '@tanstack/react-query';
import { StudentHomeDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { msUntilNextChange } from '../assignment-words';
import { studentAssignmentKeys } from './keys';

/** The lessons assigned to the student's classes, with their state, progress and what is new. */
export const getStudentHome = () => api.get('/api/student/assignments', StudentHomeDtoSchema);

// States change by themselves at opening, due and close times: ask again just after the next one
// (at most every 10 minutes, at least 5 s apart).
const REFRESH_MIN_MS = 5_000;
const REFRESH_MAX_MS = 10 * 60_000;

export const studentHomeQueryOptions = () =>
  queryOptions({
    queryKey: studentAssignmentKeys.home(),
    queryFn: getStudentHome,
    // Progress changes on the watch page: coming back to the home always asks again.
    staleTime: 0,
    refetchInterval: (query) => {
      const data = query.state.data;
      const next = data ? msUntilNextChange(data) : null;
      if (next === null) return REFRESH_MAX_MS;
      return Math.min(REFRESH_MAX_MS, Math.max(REFRESH_MIN_MS, next + 1_000));
    },
  });

export const useStudentHome = () => useQuery(studentHomeQueryOptions());
