export const watchKeys = {
  all: ['watch'] as const,
  view: (assignmentId: string) => [...watchKeys.all, assignmentId, 'view'] as const,
};
