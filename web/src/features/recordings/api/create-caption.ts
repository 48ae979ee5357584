import { useMutation, useQueryClient } from '@tanstack/react-query';
import { CaptionDtoSchema, type CaptionCreate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { recordingQueryKeys } from './keys';

/** Adds a WebVTT caption track; the API parses it and answers 400 caption_invalid with line-numbered problems. */
export const createCaption = ({ recordingId, ...body }: CaptionCreate & { recordingId: string }) =>
  api.post(`/api/recordings/${encodeURIComponent(recordingId)}/captions`, body, CaptionDtoSchema);

export function useCreateCaption(recordingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CaptionCreate) => createCaption({ recordingId, ...body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: recordingQueryKeys.detail(recordingId) }),
  });
}
