import { queryOptions } from '@tanstack/react-query';
import { PlaybackDtoSchema } from '@core/contracts';
import { api, ApiError } from '@/lib/api-client';
import { lessonUrl } from '@/features/lessons/api/keys';

// Not under lessonKeys: invalidating a lesson (after publishing) must not re-sign and swap the playing video.
const mediaKeys = { of: (lessonId: string) => ['studio-media', lessonId] as const };

/** Freshly signed URLs of the lesson's recording (the player asks again before they expire). */
export const getLessonPlayback = (lessonId: string) => api.get(lessonUrl(lessonId, '/playback'), PlaybackDtoSchema);

export const lessonPlaybackQueryOptions = (lessonId: string) =>
  queryOptions({
    queryKey: [...mediaKeys.of(lessonId), 'playback'] as const,
    queryFn: () => getLessonPlayback(lessonId),
    // A background refetch would swap the source under a playing video; the player refreshes it itself.
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });

/** A same-origin text file (WebVTT) with the API client's error messages; the API client speaks JSON only. */
export async function getText(url: string): Promise<string> {
  let response: Response;
  try {
    response = await fetch(url, { credentials: 'same-origin', headers: { Accept: 'text/vtt, text/plain' } });
  } catch {
    throw new ApiError(0, 'network_error', 'Pinfield could not reach its server. Check your network connection and try again.');
  }
  if (!response.ok) {
    throw new ApiError(response.status, 'unexpected_response', `The server answered with status ${response.status} for ${url}.`);
  }
  return response.text();
}

export const thumbnailsQueryOptions = (lessonId: string, enabled: boolean) =>
  queryOptions({
    queryKey: [...mediaKeys.of(lessonId), 'thumbnails'] as const,
    queryFn: () => getText(lessonUrl(lessonId, '/thumbnails.vtt')),
    enabled,
    // The track's sheet URLs are signed like the video's: fetched once per visit is enough for the strip.
    staleTime: 10 * 60_000,
    refetchOnWindowFocus: false,
  });

export const captionTextQueryOptions = (lessonId: string, captionUrl: string | null) =>
  queryOptions({
    queryKey: [...mediaKeys.of(lessonId), 'caption', captionUrl] as const,
    queryFn: () => getText(captionUrl ?? ''),
    enabled: captionUrl !== null,
    staleTime: Infinity,
  });
