import { useMutation, useQueryClient } from '@tanstack/react-query';
import { DepartmentDtoSchema, type DepartmentCreate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { departmentKeys } from './keys';

export const createDepartment = (body: DepartmentCreate) => api.post('/api/admin/departments', body, DepartmentDtoSchema);

export function useCreateDepartment() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createDepartment, onSuccess: () => queryClient.invalidateQueries({ queryKey: departmentKeys.all }) });
}
