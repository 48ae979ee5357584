import { useMutation, useQueryClient } from '@tanstack/react-query';
import { MeDtoSchema, type SetActive } from '@core/contracts';
import { api, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

export const setActive = (body: SetActive) => api.put('/api/me/active', body, MeDtoSchema);

export function useSetActive() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setActive,
    onSuccess: (me) => {
      setCsrfToken(me.csrfToken);
      // Every other answer was for the previous school or role: forget it rather than show it under the new one.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
