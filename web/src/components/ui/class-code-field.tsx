import type { ComponentProps } from 'react';
import { Field } from './field';
import { Input } from './input';

type ClassCodeFieldProps = Omit<ComponentProps<typeof Input>, 'id' | 'aria-describedby' | 'invalid'> & { error?: string };

/** The class code input that signed-in and signed-out students both fill in; spread `form.register('code')` on it. */
export function ClassCodeField({ error, ...inputProps }: ClassCodeFieldProps) {
  return (
    <Field label="Class code" hint="8 letters and digits, from your teacher." error={error}>
      {(control) => (
        <Input
          {...control}
          {...inputProps}
          // Codes are letters and digits, not words: no autofill, spelling fixes or lower case.
          autoComplete="off"
          autoCapitalize="characters"
          spellCheck={false}
          mono
          className="uppercase tracking-widest"
        />
      )}
    </Field>
  );
}
