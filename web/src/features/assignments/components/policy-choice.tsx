import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { FieldError } from '@/components/ui/field';

export type PolicyOption<V extends string> = { value: V; label: string; hint: string };

type PolicyChoiceProps<V extends string> = {
  legend: string;
  options: readonly PolicyOption<V>[];
  /** `form.register(name)`, spread on every radio of the group. */
  registration: UseFormRegisterReturn;
  error?: string;
};

/** A policy as radio buttons in a fieldset, each choice with the one line saying what students then see. */
export function PolicyChoice<V extends string>({ legend, options, registration, error }: PolicyChoiceProps<V>) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={error ? errorId : undefined}>
      <legend className="mb-1 font-bold">{legend}</legend>
      {options.map((option) => (
        <label
          key={option.value}
          className="flex cursor-pointer items-start gap-3 rounded-md border border-line p-3 has-checked:border-teal has-checked:bg-teal-soft"
        >
          <input
            type="radio"
            value={option.value}
            // The choice's name is its label; its explanation is read as the description.
            aria-labelledby={`${id}-${option.value}-label`}
            aria-describedby={`${id}-${option.value}`}
            className="mt-1 size-5 shrink-0 accent-teal"
            {...registration}
          />
          <span>
            <span id={`${id}-${option.value}-label`} className="font-bold">
              {option.label}
            </span>
            <span id={`${id}-${option.value}`} className="block text-sm text-ink-muted">
              {option.hint}
            </span>
          </span>
        </label>
      ))}
      <FieldError id={errorId} message={error} />
    </fieldset>
  );
}
