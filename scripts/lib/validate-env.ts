import type { Env } from './app-env';

/**
 * Checks the app's settings with the app's own zod schema before anything starts, so a wrong
 * value is reported at once, with the variable's name, instead of after the set-up.
 */
export async function validateAppEnv(app: Env): Promise<void> {
  const { loadEnv } = await import('../../api/src/env');
  try {
    loadEnv({ ...process.env, ...app });
  } catch (error) {
    throw new Error(`The app cannot start with these settings. ${error instanceof Error ? error.message : String(error)}`);
  }
}
