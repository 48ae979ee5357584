import { queryOptions, useQuery } from '@tanstack/react-query';
import { StudentClassListDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { classKeys } from './keys';

export const getStudentClasses = () => api.get('/api/student/classes', StudentClassListDtoSchema);

export const studentClassesQueryOptions = () => queryOptions({ queryKey: classKeys.studentList(), queryFn: getStudentClasses });

export const useStudentClasses = () => useQuery(studentClassesQueryOptions());
