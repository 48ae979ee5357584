import { useMutation, useQueryClient } from '@tanstack/react-query';
import { MeDtoSchema, type EmailLinkVerify } from '@core/contracts';
import { api, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

/** Uses up the sign-in link's token. Only ever called from a button press: a GET must never consume it. */
export const verifyEmailLink = (body: EmailLinkVerify) => api.post('/api/auth/email-link/verify', body, MeDtoSchema);

export function useVerifyEmailLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: verifyEmailLink,
    onSuccess: (me) => {
      // The session was regenerated at sign-in: its CSRF token replaces the signed-out one.
      setCsrfToken(me.csrfToken);
      queryClient.setQueryData(authKeys.me(), me);
    },
  });
}
