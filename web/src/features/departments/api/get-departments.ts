import { queryOptions, useQuery } from '@tanstack/react-query';
import { DepartmentListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { departmentKeys } from './keys';

/** The school's departments, for admins. */
export const getDepartments = () => api.get('/api/admin/departments', DepartmentListDtoSchema);

export const departmentsQueryOptions = () => queryOptions({ queryKey: departmentKeys.adminList(), queryFn: getDepartments });

export const useDepartments = () => useQuery(departmentsQueryOptions());
