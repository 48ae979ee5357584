import { useMutation } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';
import { assignmentApi } from './paths';

/** Records that the student read the safety notes (the server keeps the first time). */
export const acknowledgeSafety = (assignmentId: string) => api.post(assignmentApi(assignmentId, '/safety'), {});

export const useAcknowledgeSafety = (assignmentId: string) =>
  useMutation({
    mutationFn: () => acknowledgeSafety(assignmentId),
    // Offline it waits for the connection (networkMode 'online'); a failed request is tried again, a refusal is not.
    retry: (failures, error) => failures < 5 && !(isApiError(error) && error.status >= 400 && error.status < 500),
    retryDelay: (failures) => Math.min(30_000, 1000 * 2 ** failures),
  });
