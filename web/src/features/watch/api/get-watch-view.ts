import { queryOptions, useQuery } from '@tanstack/react-query';
import { WatchViewDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { serverClock } from '../server-clock';
import { watchKeys } from './keys';
import { assignmentApi } from './paths';

/** The assignment as this student watches it: the allow-listed view, playback, what they answered, where they stopped. */
export async function getWatchView(assignmentId: string) {
  const view = await api.get(assignmentApi(assignmentId, '/watch'), WatchViewDtoSchema);
  serverClock.observe(view.serverTime);
  return view;
}

export const watchViewQueryOptions = (assignmentId: string) =>
  queryOptions({
    queryKey: watchKeys.view(assignmentId),
    queryFn: () => getWatchView(assignmentId),
    // The player keeps its own state from the first copy; a refetch only brings fresh playback URLs when asked.
    staleTime: Infinity,
    refetchOnWindowFocus: false,
    refetchOnReconnect: false,
  });

export const useWatchView = (assignmentId: string) => useQuery(watchViewQueryOptions(assignmentId));
