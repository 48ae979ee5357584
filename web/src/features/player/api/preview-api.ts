import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import {
  CheckpointGradeDtoSchema,
  PlaybackDtoSchema,
  StudentLessonViewSchema,
  type CheckpointAnswer,
  type PreviewAnswer,
} from '@core/contracts';
import { api } from '@/lib/api-client';

const lessonPath = (lessonId: string, rest: string) => `/api/lessons/${encodeURIComponent(lessonId)}${rest}`;

export const previewKeys = {
  all: ['lesson-preview'] as const,
  view: (lessonId: string) => [...previewKeys.all, lessonId, 'view'] as const,
  playback: (lessonId: string) => [...previewKeys.all, lessonId, 'playback'] as const,
};

/** The draft as a student would see it: no answer keys (the server strips them). */
export const getLessonPreview = (lessonId: string) => api.get(lessonPath(lessonId, '/preview'), StudentLessonViewSchema);

export const lessonPreviewQueryOptions = (lessonId: string) =>
  queryOptions({
    queryKey: previewKeys.view(lessonId),
    queryFn: () => getLessonPreview(lessonId),
    // A refetch in the background would reset the open overlay; "Restart preview" asks for a fresh copy.
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });

export const useLessonPreview = (lessonId: string) => useQuery(lessonPreviewQueryOptions(lessonId));

/** Freshly signed URLs of the lesson's recording. */
export const getPreviewPlayback = (lessonId: string) => api.get(lessonPath(lessonId, '/playback'), PlaybackDtoSchema);

export const previewPlaybackQueryOptions = (lessonId: string) =>
  queryOptions({
    queryKey: previewKeys.playback(lessonId),
    queryFn: () => getPreviewPlayback(lessonId),
    // The player asks for new URLs itself before they expire; a background refetch would swap the source for nothing.
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });

export const usePreviewPlayback = (lessonId: string) => useQuery(previewPlaybackQueryOptions(lessonId));

/** Graded by the server's engine exactly as a student's answer; nothing is stored. */
export const answerPreview = (lessonId: string, key: string, body: PreviewAnswer) =>
  api.post(lessonPath(lessonId, `/preview/checkpoints/${encodeURIComponent(key)}/answer`), body, CheckpointGradeDtoSchema);

export const useAnswerPreview = (lessonId: string) =>
  useMutation({
    mutationFn: ({ key, answer, attempt }: { key: string; answer: CheckpointAnswer; attempt: number }) =>
      answerPreview(lessonId, key, { attempt, answer }),
  });
