/** Query keys of the auth feature (TkDodo's key factories): everything under `auth` is the signed-in person and sign-in config. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
  config: () => [...authKeys.all, 'config'] as const,
};
