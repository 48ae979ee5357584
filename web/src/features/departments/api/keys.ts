export const departmentKeys = {
  all: ['departments'] as const,
  adminList: () => [...departmentKeys.all, 'admin'] as const,
  overview: () => [...departmentKeys.all, 'overview'] as const,
};
