import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { PeoplePageDtoSchema } from '@core/contracts';
import { api } from '@/lib/api-client';
import { peopleKeys, type PeopleFilters } from './keys';

/** One page of the school's people; search (q), role filter and paging happen on the server. */
export const getPeople = (filters: PeopleFilters) =>
  api.get('/api/admin/people', PeoplePageDtoSchema, {
    q: filters.q?.trim() || undefined,
    role: filters.role,
    page: filters.page,
    pageSize: filters.pageSize,
  });

export const peopleQueryOptions = (filters: PeopleFilters) =>
  queryOptions({ queryKey: peopleKeys.list(filters), queryFn: () => getPeople(filters), placeholderData: keepPreviousData });

export const usePeople = (filters: PeopleFilters) => useQuery(peopleQueryOptions(filters));
