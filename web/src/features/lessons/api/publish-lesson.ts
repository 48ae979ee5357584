import { useMutation, useQueryClient } from '@tanstack/react-query';
import { VersionSummaryDtoSchema, type Publish } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonKeys, lessonUrl } from './keys';

/**
 * Freezes the draft at `revision` as the next version. Refusals: 400 lesson_not_ready (details = the problems),
 * 409 edit_conflict (a newer draft was saved), 409 nothing_to_publish.
 */
export const publishLesson = (lessonId: string, body: Publish) => api.post(lessonUrl(lessonId, '/publish'), body, VersionSummaryDtoSchema);

export function usePublishLesson(lessonId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Publish) => publishLesson(lessonId, body),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: lessonKeys.detail(lessonId) }),
        queryClient.invalidateQueries({ queryKey: lessonKeys.lists() }),
      ]),
  });
}
