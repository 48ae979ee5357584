import { useMutation, useQueryClient } from '@tanstack/react-query';
import { AssignmentCreatedDtoSchema, type AssignmentCreate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { assignmentKeys } from './keys';

/**
 * Assigns one version of a lesson to one or more classes: one assignment per class. Refusals: 400 with
 * details on the fields, 403 a class that is not the caller's, 404 an unknown lesson or version.
 */
export const createAssignments = (body: AssignmentCreate) => api.post('/api/assignments', body, AssignmentCreatedDtoSchema);

export function useCreateAssignments() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAssignments,
    onSuccess: async (created) => {
      for (const assignment of created.assignments) queryClient.setQueryData(assignmentKeys.detail(assignment.id), assignment);
      await queryClient.invalidateQueries({ queryKey: assignmentKeys.lists() });
    },
  });
}
