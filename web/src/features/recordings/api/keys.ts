import type { RecordingListQuery } from '@core/contracts';

export type RecordingFilters = RecordingListQuery;

/** Query keys of recordings; a change to one recording invalidates `recordingQueryKeys.all` (lists and details). */
export const recordingQueryKeys = {
  all: ['recordings'] as const,
  lists: () => [...recordingQueryKeys.all, 'list'] as const,
  list: (filters: RecordingFilters) => [...recordingQueryKeys.lists(), filters] as const,
  details: () => [...recordingQueryKeys.all, 'detail'] as const,
  detail: (recordingId: string) => [...recordingQueryKeys.details(), recordingId] as const,
  playback: (recordingId: string) => [...recordingQueryKeys.detail(recordingId), 'playback'] as const,
};

/** The caller's unfinished uploads and upload limits. */
export const uploadQueryKeys = {
  all: ['uploads'] as const,
  open: () => [...uploadQueryKeys.all, 'open'] as const,
};
