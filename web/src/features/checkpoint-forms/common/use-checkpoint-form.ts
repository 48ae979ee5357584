import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef } from 'react';
import { useForm, type DefaultValues, type UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import type { Checkpoint } from '@core/contracts';
import { canonicalJson } from '@core/lessons/canonical-json';

/**
 * A react-hook-form form over one checkpoint, validated by its contract schema as the teacher types.
 * Controlled from outside: every edit calls onChange with a fresh copy at once (the studio autosaves
 * and keeps undo history), and a checkpoint from the props that differs from what the form holds
 * (undo, a timeline drag) replaces the form's values. The checkpoint the form itself just sent back
 * is recognised by its content, so re-renders with it never reset the fields under the teacher's cursor.
 */
export function useCheckpointForm<T extends Checkpoint>(
  schema: z.ZodType<T, T>,
  checkpoint: T,
  onChange: (next: T) => void,
): UseFormReturn<T, unknown, T> {
  const form = useForm<T, unknown, T>({
    resolver: zodResolver(schema),
    mode: 'onChange',
    defaultValues: checkpoint as DefaultValues<T>,
  });
  const known = useRef(canonicalJson(checkpoint));
  const emit = useRef(onChange);
  useEffect(() => {
    emit.current = onChange;
  }, [onChange]);

  useEffect(() => {
    let scheduled = false;
    const flush = () => {
      scheduled = false;
      const values = form.getValues();
      const text = canonicalJson(values);
      if (text === known.current) return;
      known.current = text;
      // A copy: the form keeps mutating its own arrays, the studio's history must not change with them.
      emit.current(structuredClone(values));
    };
    // Edits made by one action (ticking "one correct" also unticks the others) reach the studio as one change.
    return form.subscribe({
      formState: { values: true },
      callback: () => {
        if (scheduled) return;
        scheduled = true;
        queueMicrotask(flush);
      },
    });
  }, [form]);

  useEffect(() => {
    const text = canonicalJson(checkpoint);
    if (text === known.current) return;
    known.current = text;
    form.reset(checkpoint);
    void form.trigger();
  }, [checkpoint, form]);

  // A loaded or imported checkpoint shows what breaks its contract straight away.
  useEffect(() => {
    void form.trigger();
  }, [form]);

  return form;
}
