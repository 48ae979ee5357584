import { useMutation, useQueryClient } from '@tanstack/react-query';
import { ClassDtoSchema, type ClassCreate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

export const createClass = (body: ClassCreate) => api.post('/api/admin/classes', body, ClassDtoSchema);

export function useCreateClass() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createClass, onSuccess: () => queryClient.invalidateQueries({ queryKey: classKeys.all }) });
}
