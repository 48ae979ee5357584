import { queryOptions, useQuery } from '@tanstack/react-query';
import { ClassListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

export const getTeacherClasses = () => api.get('/api/teacher/classes', ClassListDtoSchema);

export const teacherClassesQueryOptions = () => queryOptions({ queryKey: classKeys.teacherList(), queryFn: getTeacherClasses });

export const useTeacherClasses = () => useQuery(teacherClassesQueryOptions());
