import { useMemo, type ReactNode } from 'react';
import { FormProvider, type FieldValues, type UseFormReturn } from 'react-hook-form';
import type { LessonProblem } from '@core/contracts';
import { AlertIcon } from '@/components/ui/icons';
import { FormEnvContext, type FormEnv } from './form-env';
import { placeProblems, ProblemPlacementContext } from './problem-placement';

type FormShellProps<T extends FieldValues> = {
  form: UseFormReturn<T, unknown, T>;
  /** The kind's name, for the form's accessible name. */
  title: string;
  problems: readonly LessonProblem[];
  /** Paths of the fields this form renders (see placeProblems). */
  anchors: readonly string[];
  env: FormEnv;
  children: ReactNode;
};

/**
 * The frame every checkpoint form shares: its context, and the problems no field could take. Pass
 * the fields as a memo() component: they read their values from the form, so the studio echoing each
 * change back does not re-render all of them.
 */
export function FormShell<T extends FieldValues>({ form, title, problems, anchors, env, children }: FormShellProps<T>) {
  // Stable context values: fields re-render for their own value, not for every change the studio echoes back.
  const anchorText = anchors.join('\n');
  const placement = useMemo(() => placeProblems(problems, anchorText.split('\n')), [problems, anchorText]);
  const { lessonId, durationMs } = env;
  const formEnv = useMemo(() => ({ lessonId, durationMs }), [lessonId, durationMs]);
  return (
    <FormProvider {...form}>
      <FormEnvContext value={formEnv}>
        <ProblemPlacementContext value={placement}>
          {/* Edits save as they happen: Enter in a field must not submit anything. */}
          <form aria-label={title} noValidate onSubmit={(event) => event.preventDefault()} className="flex flex-col gap-6">
            {placement.unplaced.length > 0 ? (
              <div role="alert" className="rounded-md border-2 border-danger bg-danger-soft p-3 text-danger">
                <p className="flex items-center gap-1.5 font-bold">
                  <AlertIcon className="size-4" />
                  To fix before publishing
                </p>
                <ul className="mt-1 list-disc pl-6">
                  {placement.unplaced.map((problem) => (
                    <li key={`${problem.path}:${problem.message}`}>{problem.message}</li>
                  ))}
                </ul>
              </div>
            ) : null}
            {children}
          </form>
        </ProblemPlacementContext>
      </FormEnvContext>
    </FormProvider>
  );
}

/** A titled part of a form. */
export function FormSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-4 border-t border-line pt-4 first:border-t-0 first:pt-0">
      <h3 className="text-lg">{title}</h3>
      {children}
    </div>
  );
}
