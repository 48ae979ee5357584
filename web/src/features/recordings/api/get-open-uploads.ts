import { queryOptions, useQuery } from '@tanstack/react-query';
import { OpenUploadListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { uploadQueryKeys } from './keys';

/** The caller's unfinished uploads (their files must be chosen again) and the upload limits. */
export const getOpenUploads = () => api.get('/api/uploads', OpenUploadListDtoSchema);

export const openUploadsQueryOptions = () => queryOptions({ queryKey: uploadQueryKeys.open(), queryFn: getOpenUploads });

export const useOpenUploads = () => useQuery(openUploadsQueryOptions());
