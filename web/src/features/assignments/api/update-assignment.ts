import { useMutation, useQueryClient } from '@tanstack/react-query';
import { AssignmentDtoSchema, type AssignmentUpdate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { assignmentKeys, assignmentUrl } from './keys';

/** Changes an assignment's dates and policies (the version changes only through a move). */
export const updateAssignment = (assignmentId: string, body: AssignmentUpdate) =>
  api.put(assignmentUrl(assignmentId), body, AssignmentDtoSchema);

export function useUpdateAssignment(assignmentId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: AssignmentUpdate) => updateAssignment(assignmentId, body),
    onSuccess: async (assignment) => {
      queryClient.setQueryData(assignmentKeys.detail(assignmentId), assignment);
      await queryClient.invalidateQueries({ queryKey: assignmentKeys.lists() });
    },
  });
}
