import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { recordingQueryKeys, uploadQueryKeys } from './keys';

/** Gives up an unfinished upload: the API aborts it in storage and removes its `uploading` recording. */
export const discardUpload = (uploadId: string) => api.delete(`/api/uploads/${encodeURIComponent(uploadId)}`);

export function useDiscardUpload() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: discardUpload,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: uploadQueryKeys.all }),
        queryClient.invalidateQueries({ queryKey: recordingQueryKeys.lists() }),
      ]),
  });
}
