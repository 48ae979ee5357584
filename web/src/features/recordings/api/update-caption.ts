import { useMutation, useQueryClient } from '@tanstack/react-query';
import { CaptionDtoSchema, type CaptionUpdate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { recordingQueryKeys } from './keys';

export const updateCaption = ({ recordingId, captionId, ...body }: CaptionUpdate & { recordingId: string; captionId: string }) =>
  api.patch(`/api/recordings/${encodeURIComponent(recordingId)}/captions/${encodeURIComponent(captionId)}`, body, CaptionDtoSchema);

export function useUpdateCaption(recordingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CaptionUpdate & { captionId: string }) => updateCaption({ recordingId, ...input }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recordingQueryKeys.detail(recordingId) }),
  });
}
