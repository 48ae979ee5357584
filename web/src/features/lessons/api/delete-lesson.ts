import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { lessonKeys, lessonUrl } from './keys';

/** Deletes a lesson that was never published (409 lesson_published: archive it instead). */
export const deleteLesson = (lessonId: string) => api.delete(lessonUrl(lessonId));

export function useDeleteLesson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLesson,
    onSuccess: async (_result, lessonId) => {
      // A deleted lesson's detail would only answer 404: drop it rather than refetch it.
      queryClient.removeQueries({ queryKey: lessonKeys.detail(lessonId) });
      await queryClient.invalidateQueries({ queryKey: lessonKeys.lists() });
    },
  });
}
