import type { ComponentProps, ReactNode } from 'react';
import { Field } from './field';
import { Select } from './input';

export type NamedOption = { id: string; name: string };

type OptionFieldProps = Omit<ComponentProps<typeof Select>, 'id' | 'aria-describedby' | 'invalid'> & {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  options: NamedOption[];
  /** The first choice, value '': register with `setValueAs: emptyToNull` so it stands for null. */
  emptyLabel: string;
};

/** A labelled select of named records (a department, a teacher, a class) that may be left empty. */
export function OptionField({ label, hint, error, options, emptyLabel, ...selectProps }: OptionFieldProps) {
  return (
    <Field label={label} hint={hint} error={error}>
      {(control) => (
        <Select {...control} {...selectProps}>
          <option value="">{emptyLabel}</option>
          {options.map((item) => (
            <option key={item.id} value={item.id}>
              {item.name}
            </option>
          ))}
        </Select>
      )}
    </Field>
  );
}
