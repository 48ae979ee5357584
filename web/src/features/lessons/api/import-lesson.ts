import { useMutation, useQueryClient } from '@tanstack/react-query';
import { LessonDtoSchema, type LessonImport } from '@core/contracts';
import { api } from '@/lib/api-client';
import { lessonKeys } from './keys';

/** A new draft lesson from a lesson file; 400 lesson_file_invalid lists the problems by line ('line 12'). */
export const importLesson = (body: LessonImport) => api.post('/api/lessons/import', body, LessonDtoSchema);

export function useImportLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importLesson,
    onSuccess: async (lesson) => {
      queryClient.setQueryData(lessonKeys.detail(lesson.id), lesson);
      await queryClient.invalidateQueries({ queryKey: lessonKeys.lists() });
    },
  });
}
