import { useMutation, useQueryClient } from '@tanstack/react-query';
import { AssignmentMovedDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { assignmentKeys, assignmentUrl } from './keys';

/**
 * Moves an assignment onto a corrected version of its lesson; the server regrades the answers at the changed
 * checkpoints. Refusal: 409 with the differences that make the versions incompatible.
 */
export const moveAssignment = (assignmentId: string, versionNumber: number) =>
  api.post(assignmentUrl(assignmentId, '/move'), { versionNumber }, AssignmentMovedDtoSchema);

export function useMoveAssignment(assignmentId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (versionNumber: number) => moveAssignment(assignmentId, versionNumber),
    onSuccess: async (moved) => {
      queryClient.setQueryData(assignmentKeys.detail(assignmentId), moved.assignment);
      await queryClient.invalidateQueries({ queryKey: assignmentKeys.lists() });
    },
  });
}
