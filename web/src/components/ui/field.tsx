import { useId, type ReactNode } from 'react';
import { cn } from '@/lib/cn';
import { AlertIcon } from './icons';

export type FieldControlProps = { id: string; 'aria-describedby'?: string; invalid: boolean };

type FieldProps = {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  className?: string;
  /** Renders the control with the ids that tie it to its label, hint and error. */
  children: (control: FieldControlProps) => ReactNode;
};

/** A labelled form control with its hint and its error message right below it (read out by screen readers). */
export function Field({ label, hint, error, className, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      {children({ id, 'aria-describedby': describedBy, invalid: Boolean(error) })}
      <FieldError id={errorId} message={error} />
    </div>
  );
}

export function FieldError({ id, message }: { id?: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="flex items-start gap-1.5 text-sm font-bold text-danger">
      <AlertIcon className="mt-0.5 size-4 shrink-0" />
      <span>{message}</span>
    </p>
  );
}
