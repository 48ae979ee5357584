import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { RecordingListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { recordingQueryKeys, type RecordingFilters } from './keys';
import { pollInterval } from './polling';

/** The school's recordings (or the caller's own), searched, filtered and sorted on the server. */
export const getRecordings = (filters: RecordingFilters) =>
  api.get('/api/recordings', RecordingListDtoSchema, {
    q: filters.q?.trim() || undefined,
    state: filters.state,
    owner: filters.owner,
    sort: filters.sort,
  });

export const recordingsQueryOptions = (filters: RecordingFilters) =>
  queryOptions({
    queryKey: recordingQueryKeys.list(filters),
    queryFn: () => getRecordings(filters),
    placeholderData: keepPreviousData,
    // States change on the server (processing progress, ready, failed): the list follows by itself.
    refetchInterval: (query) => pollInterval(query.state.data?.recordings),
  });

export const useRecordings = (filters: RecordingFilters) => useQuery(recordingsQueryOptions(filters));
