import { createContext, useContext } from 'react';

/** What fields need from around the form: the lesson (image uploads) and the recording's length. */
export type FormEnv = { lessonId: string; durationMs: number };

export const FormEnvContext = createContext<FormEnv>({ lessonId: '', durationMs: 0 });

export function useFormEnv(): FormEnv {
  return useContext(FormEnvContext);
}
