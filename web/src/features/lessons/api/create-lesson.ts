import { useMutation, useQueryClient } from '@tanstack/react-query';
import { LessonDtoSchema, type LessonCreate } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonKeys } from './keys';

/** A new draft lesson on a ready recording (400 recording_not_ready when it is not). */
export const createLesson = (body: LessonCreate) => api.post('/api/lessons', body, LessonDtoSchema);

export function useCreateLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createLesson,
    onSuccess: async (lesson) => {
      queryClient.setQueryData(lessonKeys.detail(lesson.id), lesson);
      await queryClient.invalidateQueries({ queryKey: lessonKeys.lists() });
    },
  });
}
