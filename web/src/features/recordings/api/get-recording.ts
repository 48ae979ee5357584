import { queryOptions, useQuery } from '@tanstack/react-query';
import { RecordingDetailDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { recordingQueryKeys } from './keys';
import { pollInterval } from './polling';

export const getRecording = (recordingId: string) =>
  api.get(`/api/recordings/${encodeURIComponent(recordingId)}`, RecordingDetailDtoSchema);

export const recordingQueryOptions = (recordingId: string) =>
  queryOptions({
    queryKey: recordingQueryKeys.detail(recordingId),
    queryFn: () => getRecording(recordingId),
    refetchInterval: (query) => pollInterval(query.state.data ? [query.state.data] : undefined),
  });

export const useRecording = (recordingId: string) => useQuery(recordingQueryOptions(recordingId));

/** Where the browser downloads the original file (the API answers with a redirect to a short-lived storage URL). */
export const recordingDownloadUrl = (recordingId: string) => `/api/recordings/${encodeURIComponent(recordingId)}/download`;
