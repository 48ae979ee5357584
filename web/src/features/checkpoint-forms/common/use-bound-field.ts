import { get, useFormContext, useFormState, useWatch, type FieldError } from 'react-hook-form';
import { useProblemsAt } from './problem-placement';

type ErrorNode = (FieldError & { root?: FieldError }) | undefined;

/** The zod message at a path: the field's own, or an array's (stored under `root` by the resolver). */
function zodMessage(errors: unknown, path: string): string | undefined {
  const node = get(errors, path) as ErrorNode;
  return node?.message ?? node?.root?.message;
}

/** Joins the messages for one field: the contract's check first, then the publish rule's. */
export function joinMessages(...messages: (string | undefined | null)[]): string | undefined {
  const unique = [...new Set(messages.filter((m): m is string => Boolean(m)))];
  return unique.length > 0 ? unique.join(' ') : undefined;
}

/**
 * One field of the checkpoint form: its current value, a setter that validates as the teacher types
 * (the change reaches the studio through the form's subscription), and its messages.
 */
export function useBoundField<V>(path: string) {
  const { control, setValue } = useFormContext();
  const value = useWatch({ control, name: path }) as V;
  const { errors } = useFormState({ control, name: path });
  const problem = useProblemsAt(path);
  const zod = zodMessage(errors, path);
  return {
    value,
    set: (next: V) => setValue(path, next, { shouldValidate: true, shouldDirty: true, shouldTouch: true }),
    zodError: zod,
    problem,
    error: joinMessages(zod, problem),
  };
}
