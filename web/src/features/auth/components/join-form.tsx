import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { JoinClassRequestSchema } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { LiveRegion } from '@/components/ui/live-region';
import { applyServerErrors } from '@/lib/form-errors';
import { useJoinByCode } from '../api/join-by-code';

type FormInput = z.input<typeof JoinClassRequestSchema>;
type FormOutput = z.output<typeof JoinClassRequestSchema>;

/** A student without an account asks to join a class by its code; a join link arrives by e-mail if the school allows it. */
export function JoinForm() {
  const mutation = useJoinByCode();
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(JoinClassRequestSchema),
    defaultValues: { code: '', email: '', name: '' },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setBanner(null);
    try {
      await mutation.mutateAsync(values);
    } catch (error) {
      setBanner(applyServerErrors(error, form.setError, ['code', 'email', 'name']).bannerMessage);
    }
  });

  return (
    <form onSubmit={(event) => void onSubmit(event)} noValidate className="flex flex-col gap-4">
      <Field label="Class code" hint="8 letters and digits, from your teacher." error={errors.code?.message}>
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
      <Field label="Your name" hint="As your teacher should see it." error={errors.name?.message}>
        {(control) => <Input {...control} {...form.register('name')} autoComplete="name" />}
      </Field>
      <Field label="Your school e-mail address" error={errors.email?.message}>
        {(control) => <Input {...control} {...form.register('email')} type="email" autoComplete="email" inputMode="email" mono />}
      </Field>
      <div>
        <Button type="submit" busy={mutation.isPending}>
          Ask to join
        </Button>
      </div>
      <LiveRegion>
        {mutation.isSuccess ? (
          <Banner tone="success" title="Request received">
            {mutation.data.message}
          </Banner>
        ) : null}
      </LiveRegion>
      {banner ? (
        <Banner tone="error" title="The request was not sent">
          {banner}
        </Banner>
      ) : null}
    </form>
  );
}
