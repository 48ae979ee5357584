import { queryOptions, useQuery } from '@tanstack/react-query';
import { AssignmentListDtoSchema, type AssignmentListQuery } from '@core/contracts';
import { api } from '@/lib/api-client';
import { assignmentKeys } from './keys';

/** The assignments the caller may see, of one class or one lesson (the API scopes them to the caller's school). */
export const getAssignments = (filters: AssignmentListQuery) =>
  api.get('/api/assignments', AssignmentListDtoSchema, { classId: filters.classId, lessonId: filters.lessonId });

export const assignmentsQueryOptions = (filters: AssignmentListQuery) =>
  queryOptions({ queryKey: assignmentKeys.list(filters), queryFn: () => getAssignments(filters) });

export const useAssignments = (filters: AssignmentListQuery) => useQuery(assignmentsQueryOptions(filters));
