/** Query keys of classes; mutations invalidate `classKeys.all` so every list and detail refreshes. */
export const classKeys = {
  all: ['classes'] as const,
  lists: () => [...classKeys.all, 'list'] as const,
  teacherList: () => [...classKeys.lists(), 'teacher'] as const,
  studentList: () => [...classKeys.lists(), 'student'] as const,
  adminList: () => [...classKeys.lists(), 'admin'] as const,
  details: () => [...classKeys.all, 'detail'] as const,
  detail: (classId: string) => [...classKeys.details(), classId] as const,
};
