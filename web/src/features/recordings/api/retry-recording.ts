import { useMutation, useQueryClient } from '@tanstack/react-query';
import { RecordingDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { recordingQueryKeys } from './keys';

/** Sends a failed recording back to processing (only failures the API marks retryable). */
export const retryRecording = (recordingId: string) =>
  api.post(`/api/recordings/${encodeURIComponent(recordingId)}/retry`, {}, RecordingDtoSchema);

export function useRetryRecording() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryRecording,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recordingQueryKeys.all }),
  });
}
