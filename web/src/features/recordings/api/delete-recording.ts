import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { recordingQueryKeys, uploadQueryKeys } from './keys';

/** Deletes the recording with every stored object of it (original, rendition, poster, thumbnails, captions). */
export const deleteRecording = (recordingId: string) => api.delete(`/api/recordings/${encodeURIComponent(recordingId)}`);

export function useDeleteRecording() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteRecording,
    onSuccess: async (_result, recordingId) => {
      // The detail of a deleted recording would only answer 404: drop it instead of refetching it.
      queryClient.removeQueries({ queryKey: recordingQueryKeys.detail(recordingId) });
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: recordingQueryKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: uploadQueryKeys.all }),
      ]);
    },
  });
}
