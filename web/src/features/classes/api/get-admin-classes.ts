import { queryOptions, useQuery } from '@tanstack/react-query';
import { ClassListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

export const getAdminClasses = () => api.get('/api/admin/classes', ClassListDtoSchema);

export const adminClassesQueryOptions = () => queryOptions({ queryKey: classKeys.adminList(), queryFn: getAdminClasses });

export const useAdminClasses = () => useQuery(adminClassesQueryOptions());
