import { useMutation, useQueryClient } from '@tanstack/react-query';
import { RosterImportDtoSchema, type RosterUpload } from '@core/contracts';
import { api } from '@/lib/api-client';

/** Saves the whole roster or nothing (400 roster_invalid lists the bad lines). */
export const importRoster = (body: RosterUpload) => api.post('/api/admin/roster/import', body, RosterImportDtoSchema);

export function useImportRoster() {
  const queryClient = useQueryClient();
  // An import adds people and enrolments: every admin list may have changed.
  return useMutation({ mutationFn: importRoster, onSuccess: () => queryClient.invalidateQueries() });
}
