import { useMutation, useQueryClient } from '@tanstack/react-query';
import { LessonDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonKeys, lessonUrl } from './keys';

/** A copy in the caller's own library: "Copy of …", a draft, not shared, with new checkpoint keys. */
export const duplicateLesson = (lessonId: string) => api.post(lessonUrl(lessonId, '/duplicate'), undefined, LessonDtoSchema);

export function useDuplicateLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: duplicateLesson,
    onSuccess: async (copy) => {
      queryClient.setQueryData(lessonKeys.detail(copy.id), copy);
      await queryClient.invalidateQueries({ queryKey: lessonKeys.lists() });
    },
  });
}
