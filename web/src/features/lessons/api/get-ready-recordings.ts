import { queryOptions, useQuery } from '@tanstack/react-query';
import { RecordingListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import type { RecordingChoice } from '../components/recording-select';
import { lessonKeys } from './keys';

/** The school's ready recordings, by title: what a new or imported lesson can be built on. */
export const getReadyRecordings = async (): Promise<RecordingChoice[]> => {
  const list = await api.get('/api/recordings', RecordingListDtoSchema, { state: 'ready', owner: 'school', sort: 'title' });
  return list.recordings
    .filter((recording) => recording.state === 'ready')
    .map((recording) => ({ id: recording.id, title: recording.title, durationSeconds: recording.durationSeconds }));
};

export const readyRecordingsQueryOptions = () =>
  queryOptions({ queryKey: [...lessonKeys.all, 'ready-recordings'] as const, queryFn: getReadyRecordings });

export const useReadyRecordings = () => useQuery(readyRecordingsQueryOptions());
