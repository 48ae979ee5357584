import { queryOptions, useQuery } from '@tanstack/react-query';
import { PlaybackDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { recordingQueryKeys } from './keys';

/** Freshly signed URLs for playing a ready recording. */
export const getPlayback = (recordingId: string) =>
  api.get(`/api/recordings/${encodeURIComponent(recordingId)}/playback`, PlaybackDtoSchema);

export const playbackQueryOptions = (recordingId: string) =>
  queryOptions({
    queryKey: recordingQueryKeys.playback(recordingId),
    queryFn: () => getPlayback(recordingId),
    // The player asks for new URLs itself (before they expire, or after a media error); a background
    // refetch would swap the source under a playing video for no reason.
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });

export const usePlayback = (recordingId: string, enabled: boolean) => useQuery({ ...playbackQueryOptions(recordingId), enabled });
