import { useMutation, useQueryClient } from '@tanstack/react-query';
import { RecordingDtoSchema, type RecordingUpdate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { recordingQueryKeys } from './keys';

export const updateRecording = ({ recordingId, ...body }: RecordingUpdate & { recordingId: string }) =>
  api.patch(`/api/recordings/${encodeURIComponent(recordingId)}`, body, RecordingDtoSchema);

export function useUpdateRecording() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRecording,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recordingQueryKeys.all }),
  });
}
