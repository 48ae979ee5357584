/** The student API of one assignment. */
export const assignmentApi = (assignmentId: string, rest = '') => `/api/student/assignments/${encodeURIComponent(assignmentId)}${rest}`;
