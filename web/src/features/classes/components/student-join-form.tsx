import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { StudentJoinSchema } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { LiveRegion } from '@/components/ui/live-region';
import { applyServerErrors } from '@/lib/form-errors';
import { useJoinClass } from '../api/join-class';

type FormInput = z.input<typeof StudentJoinSchema>;
type FormOutput = z.output<typeof StudentJoinSchema>;

/** A signed-in student enters a class code; the class then shows in their list. */
export function StudentJoinForm() {
  const mutation = useJoinClass();
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({ resolver: zodResolver(StudentJoinSchema), defaultValues: { code: '' } });

  const onSubmit = form.handleSubmit(async (values) => {
    setBanner(null);
    try {
      await mutation.mutateAsync(values);
      form.reset();
    } catch (error) {
      // "No class has that code" and "already in this class" belong next to the code.
      setBanner(applyServerErrors(error, form.setError, ['code'], 'code').bannerMessage);
    }
  });

  return (
    <form onSubmit={(event) => void onSubmit(event)} noValidate className="flex flex-col gap-3">
      <Field label="Class code" hint="8 letters and digits, from your teacher." error={form.formState.errors.code?.message}>
        {(control) => (
          <Input
            {...control}
            {...form.register('code')}
            autoComplete="off"
            autoCapitalize="characters"
            spellCheck={false}
            mono
            className="uppercase tracking-widest"
          />
        )}
      </Field>
      <div>
        <Button type="submit" busy={mutation.isPending}>
          Join class
        </Button>
      </div>
      <LiveRegion>
        {mutation.isSuccess ? (
          <Banner tone="success" title={`You joined ${mutation.data.name}`}>
            It is now in your list of classes.
          </Banner>
        ) : null}
      </LiveRegion>
      {banner ? (
        <Banner tone="error" title="You did not join a class">
          {banner}
        </Banner>
      ) : null}
    </form>
  );
}
