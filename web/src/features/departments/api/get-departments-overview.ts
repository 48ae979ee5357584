import { queryOptions, useQuery } from '@tanstack/react-query';
import { DepartmentOverviewListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { departmentKeys } from './keys';

/** The departments a coordinator leads or a substitute covers, with their staff and classes. */
export const getDepartmentsOverview = () => api.get('/api/departments/overview', DepartmentOverviewListDtoSchema);

export const departmentsOverviewQueryOptions = () => queryOptions({ queryKey: departmentKeys.overview(), queryFn: getDepartmentsOverview });

export const useDepartmentsOverview = () => useQuery(departmentsOverviewQueryOptions());
