import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { recordingQueryKeys } from './keys';

export const deleteCaption = ({ recordingId, captionId }: { recordingId: string; captionId: string }) =>
  api.delete(`/api/recordings/${encodeURIComponent(recordingId)}/captions/${encodeURIComponent(captionId)}`);

export function useDeleteCaption(recordingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (captionId: string) => deleteCaption({ recordingId, captionId }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recordingQueryKeys.detail(recordingId) }),
  });
}
