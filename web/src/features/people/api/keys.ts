import type { PeopleQuery } from '@core/contracts';

export type PeopleFilters = Partial<PeopleQuery>;

export const peopleKeys = {
  all: ['people'] as const,
  lists: () => [...peopleKeys.all, 'list'] as const,
  list: (filters: PeopleFilters) => [...peopleKeys.lists(), filters] as const,
};
