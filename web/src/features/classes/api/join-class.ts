import { useMutation, useQueryClient } from '@tanstack/react-query';
import { StudentClassDtoSchema, type StudentJoin } from '@core/contracts';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

/** A signed-in student joins a class with its code. */
export const joinClass = (body: StudentJoin) => api.post('/api/student/enrolments', body, StudentClassDtoSchema);

export function useJoinClass() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: joinClass, onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.all }) });
}
