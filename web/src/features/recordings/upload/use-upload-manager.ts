import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useSyncExternalStore } from 'react';
import { recordingQueryKeys, uploadQueryKeys } from '../api/keys';
import { UploadManager, type UploadManagerOptions, type UploadRow } from './upload-manager';

// One queue per app (per QueryClient): uploads keep going while the teacher opens a recording's page.
const managers = new WeakMap<QueryClient, UploadManager>();

/** The upload queue that belongs to this QueryClient, created on first use. */
export function uploadManagerFor(queryClient: QueryClient, options: Omit<UploadManagerOptions, 'onEvent'> = {}): UploadManager {
  let manager = managers.get(queryClient);
  if (!manager) {
    manager = new UploadManager({
      ...options,
      onEvent: () => {
        void queryClient.invalidateQueries({ queryKey: recordingQueryKeys.lists() });
        void queryClient.invalidateQueries({ queryKey: uploadQueryKeys.all });
      },
    });
    managers.set(queryClient, manager);
  }
  return manager;
}

export function useUploadManager(): UploadManager {
  return uploadManagerFor(useQueryClient());
}

/** The queue's rows; re-renders on every progress event of any file. */
export function useUploadRows(manager: UploadManager): UploadRow[] {
  return useSyncExternalStore(manager.subscribe, manager.getRows);
}
