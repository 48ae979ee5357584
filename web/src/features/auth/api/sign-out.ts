import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, setCsrfToken } from '@/lib/api-client';
import { authKeys } from './keys';

export const signOut = () => api.post('/api/auth/sign-out', undefined);

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    // Offline, say so at once (the client's "could not reach" message) rather than wait silently for a connection.
    networkMode: 'always',
    onSuccess: () => {
      setCsrfToken(null);
      // Drop every cached answer of the signed-in person, then record that nobody is signed in.
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}
