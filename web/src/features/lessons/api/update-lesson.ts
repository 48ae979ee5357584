import { useMutation, useQueryClient } from '@tanstack/react-query';
import { LessonDtoSchema, type LessonUpdate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonKeys, lessonUrl } from './keys';

/** Shares with the department (read-only) or stops sharing; archives or restores. */
export const updateLesson = (lessonId: string, body: LessonUpdate) => api.patch(lessonUrl(lessonId), body, LessonDtoSchema);

export function useUpdateLesson(lessonId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: LessonUpdate) => updateLesson(lessonId, body),
    onSuccess: async (lesson) => {
      queryClient.setQueryData(lessonKeys.detail(lessonId), lesson);
      await queryClient.invalidateQueries({ queryKey: lessonKeys.lists() });
    },
  });
}
