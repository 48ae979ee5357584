import { queryOptions, useQuery } from '@tanstack/react-query';
import { StudentResultsDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { studentResultKeys } from './keys';

/** The student's own answers at each checkpoint, with grades and reveals as the assignment's policies allow. Reading it marks the results seen. */
export const getStudentResults = (assignmentId: string) =>
  api.get(`/api/student/assignments/${encodeURIComponent(assignmentId)}/results`, StudentResultsDtoSchema);

export const studentResultsQueryOptions = (assignmentId: string) =>
  queryOptions({
    queryKey: studentResultKeys.detail(assignmentId),
    queryFn: () => getStudentResults(assignmentId),
    // Answers and regrades change it elsewhere: opening the page always asks again.
    staleTime: 0,
  });

export const useStudentResults = (assignmentId: string) => useQuery(studentResultsQueryOptions(assignmentId));
