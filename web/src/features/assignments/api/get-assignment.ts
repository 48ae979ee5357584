import { queryOptions, useQuery } from '@tanstack/react-query';
import { AssignmentDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { assignmentKeys, assignmentUrl } from './keys';

/** One assignment with its dates, policies, counts and whether the caller may manage it. */
export const getAssignment = (assignmentId: string) => api.get(assignmentUrl(assignmentId), AssignmentDtoSchema);

export const assignmentQueryOptions = (assignmentId: string) =>
  queryOptions({ queryKey: assignmentKeys.detail(assignmentId), queryFn: () => getAssignment(assignmentId) });

export const useAssignment = (assignmentId: string) => useQuery(assignmentQueryOptions(assignmentId));
