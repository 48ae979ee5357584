import { zodResolver } from '@hookform/resolvers/zod';
import { useState, type BaseSyntheticEvent } from 'react';
import { useForm, type DefaultValues, type FieldValues, type Path, type UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import { applyServerErrors } from './form-errors';

export type ContractFormOptions<TInput extends FieldValues, TOutput> = {
  /** The request's shared contract from core/: the browser checks what the API will check. */
  schema: z.ZodType<TOutput, TInput>;
  defaultValues: DefaultValues<TInput>;
  /** The fields an API error detail may land on (see applyServerErrors). */
  serverFields: readonly Path<TInput>[];
  /** The field that takes an error without details, such as a 409 about the name. */
  fallbackField?: Path<TInput>;
  /** Sends the parsed values; a rejection is shown on the fields or in the banner. */
  submit: (values: TOutput) => Promise<unknown>;
  /** Empties the form after a successful submit, ready for the next entry. */
  resetOnSuccess?: boolean;
};

export type ContractForm<TInput extends FieldValues, TOutput> = {
  form: UseFormReturn<TInput, unknown, TOutput>;
  /** For `<form onSubmit>`: validates, submits, and places server errors. */
  onSubmit: (event?: BaseSyntheticEvent) => void;
  /** The form-level message no field could take, or null. */
  banner: string | null;
};

/** A react-hook-form form validated by a core/ contract, whose server errors go next to its fields. */
export function useContractForm<TInput extends FieldValues, TOutput>({
  schema,
  defaultValues,
  serverFields,
  fallbackField,
  submit,
  resetOnSuccess = false,
}: ContractFormOptions<TInput, TOutput>): ContractForm<TInput, TOutput> {
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<TInput, unknown, TOutput>({ resolver: zodResolver(schema), defaultValues });

  const handle = form.handleSubmit(async (values) => {
    setBanner(null);
    try {
      await submit(values);
      if (resetOnSuccess) form.reset();
    } catch (error) {
      setBanner(applyServerErrors(error, form.setError, serverFields, fallbackField).bannerMessage);
    }
  });

  // The callback catches the submit's failures, so a form event handler need not await it.
  return { form, onSubmit: (event) => void handle(event), banner };
}
