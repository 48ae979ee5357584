import { useMutation, useQueryClient } from '@tanstack/react-query';
import { PersonDtoSchema, type InvitationCreate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { peopleKeys } from './keys';

/** Invites one person: the API saves them as invited and e-mails a sign-in link. */
export const createInvitation = (body: InvitationCreate) => api.post('/api/admin/invitations', body, PersonDtoSchema);

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createInvitation, onSuccess: () => queryClient.invalidateQueries({ queryKey: peopleKeys.all }) });
}
