import type { AssignmentListQuery } from '@core/contracts';

/**
 * Query keys of assignments (TkDodo's key factory): a change to one assignment updates
 * `assignmentKeys.detail(id)` and invalidates `assignmentKeys.lists()` (a class's and a lesson's lists).
 */
export const assignmentKeys = {
  all: ['assignments'] as const,
  lists: () => [...assignmentKeys.all, 'list'] as const,
  list: (filters: AssignmentListQuery) => [...assignmentKeys.lists(), filters] as const,
  details: () => [...assignmentKeys.all, 'detail'] as const,
  detail: (assignmentId: string) => [...assignmentKeys.details(), assignmentId] as const,
};

/** `/api/assignments/<id>` with the id escaped. */
export const assignmentUrl = (assignmentId: string, rest = '') => `/api/assignments/${encodeURIComponent(assignmentId)}${rest}`;
