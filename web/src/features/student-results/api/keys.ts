/**
 * Query keys of a student's results pages. They sit under the student's assignments prefix
 * (['student-assignments'], see student-assignments/api/keys.ts) so one invalidation after an answer
 * refreshes the home and every results page.
 */
export const studentResultKeys = {
  all: ['student-assignments', 'results'] as const,
  detail: (assignmentId: string) => [...studentResultKeys.all, assignmentId] as const,
};
