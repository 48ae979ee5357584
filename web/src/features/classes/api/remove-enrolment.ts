import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

export const removeEnrolment = ({ classId, userId }: { classId: string; userId: string }) =>
  api.delete(`/api/admin/classes/${encodeURIComponent(classId)}/enrolments/${encodeURIComponent(userId)}`);

export function useRemoveEnrolment() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: removeEnrolment, onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.all }) });
}
