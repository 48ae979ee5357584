import { queryOptions, useQuery } from '@tanstack/react-query';
import { SchoolDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { schoolKeys } from './keys';

export const getSchool = () => api.get('/api/admin/school', SchoolDtoSchema);

export const schoolQueryOptions = () => queryOptions({ queryKey: schoolKeys.admin(), queryFn: getSchool });

export const useSchool = () => useQuery(schoolQueryOptions());
