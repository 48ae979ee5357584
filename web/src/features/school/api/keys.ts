export const schoolKeys = { all: ['school'] as const, admin: () => [...schoolKeys.all, 'admin'] as const };
