import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { assignmentKeys, assignmentUrl } from './keys';

/** Deletes an assignment no student has answered yet (409 naming how many answers otherwise). */
export const deleteAssignment = (assignmentId: string) => api.delete(assignmentUrl(assignmentId));

export function useDeleteAssignment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteAssignment,
    onSuccess: async (_result, assignmentId) => {
      // A deleted assignment's detail would only answer 404: drop it rather than refetch it.
      queryClient.removeQueries({ queryKey: assignmentKeys.detail(assignmentId) });
      await queryClient.invalidateQueries({ queryKey: assignmentKeys.lists() });
    },
  });
}
