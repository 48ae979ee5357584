import { queryOptions, useQuery } from '@tanstack/react-query';
import { ClassDetailDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

export const getClass = (classId: string) => api.get(`/api/classes/${encodeURIComponent(classId)}`, ClassDetailDtoSchema);

export const classQueryOptions = (classId: string) =>
  queryOptions({ queryKey: classKeys.detail(classId), queryFn: () => getClass(classId) });

export const useClass = (classId: string) => useQuery(classQueryOptions(classId));
