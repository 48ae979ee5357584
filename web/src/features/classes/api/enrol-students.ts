import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ClassDetailDtoSchema, type Enrol } from '@core/contracts';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

export const enrolStudents = ({ classId, ...body }: Enrol & { classId: string }) =>
  api.post(`/api/admin/classes/${encodeURIComponent(classId)}/enrolments`, body, ClassDetailDtoSchema);

export function useEnrolStudents() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: enrolStudents,
    onSuccess: (detail) => {
      queryClient.setQueryData(classKeys.detail(detail.id), detail);
      return queryClient.invalidateQueries({ queryKey: classKeys.lists() });
    },
  });
}
