import { useMutation } from '@tanstack/react-query';
import { RosterPreviewDtoSchema, type RosterUpload } from '@core/contracts';
import { api } from '@/lib/api-client';

/** The server reads the CSV and reports every row with its problems; nothing is saved. */
export const previewRoster = (body: RosterUpload) => api.post('/api/admin/roster/preview', body, RosterPreviewDtoSchema);

export const usePreviewRoster = () => useMutation({ mutationFn: previewRoster });
