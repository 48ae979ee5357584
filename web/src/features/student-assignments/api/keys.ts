/**
 * Query keys of the student's assignments. Everything a student's answers or viewing change lives
 * under `studentAssignmentKeys.all` (the home here, each results page in student-results), so a page
 * that records an answer refreshes them all with one `invalidateQueries({ queryKey: ['student-assignments'] })`.
 */
export const studentAssignmentKeys = {
  all: ['student-assignments'] as const,
  home: () => [...studentAssignmentKeys.all, 'home'] as const,
};
