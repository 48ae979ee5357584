import { useMutation, useQueryClient } from '@tanstack/react-query';
import { PersonDtoSchema, type PersonUpdate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { peopleKeys } from './keys';

export const updatePerson = ({ userId, ...body }: PersonUpdate & { userId: string }) =>
  api.patch(`/api/admin/people/${encodeURIComponent(userId)}`, body, PersonDtoSchema);

export function useUpdatePerson() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updatePerson, onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }) });
}
