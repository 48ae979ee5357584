import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SchoolDtoSchema, type SchoolUpdate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { schoolKeys } from './keys';

export const updateSchool = (body: SchoolUpdate) => api.patch('/api/admin/school', body, SchoolDtoSchema);

export function useUpdateSchool() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSchool,
    onSuccess: (school) => {
      queryClient.setQueryData(schoolKeys.admin(), school);
      return queryClient.invalidateQueries({ queryKey: schoolKeys.all });
    },
  });
}
