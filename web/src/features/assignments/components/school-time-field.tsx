import type { ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { clockChangeNote, readBackLocal } from '../school-time';

type SchoolTimeFieldProps = {
  label: string;
  hint: ReactNode;
  timeZone: string;
  locale: string;
  /** What the input holds now, to explain a time the clock change skips or repeats. */
  value: string;
  registration: UseFormRegisterReturn;
  error?: string;
};

/** A date and time typed in the school's zone, labelled with the zone, with a note when a clock change moves it. */
export function SchoolTimeField({ label, hint, timeZone, locale, value, registration, error }: SchoolTimeFieldProps) {
  const note = clockChangeNote(value, timeZone);
  const readBack = readBackLocal(value, timeZone, locale);
  return (
    <Field
      label={
        <>
          {label} <span className="font-normal text-ink-muted">({timeZone} time)</span>
        </>
      }
      hint={
        <>
          {hint}
          {note ? <span className="mt-1 block font-bold text-ink">{note}</span> : null}
        </>
      }
      error={error}
    >
      {(control) => (
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
          <Input {...control} {...registration} type="datetime-local" mono className="max-w-72" />
          {readBack ? <span className="text-sm text-ink-muted">{readBack}</span> : null}
        </div>
      )}
    </Field>
  );
}
