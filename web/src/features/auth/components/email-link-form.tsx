import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { EmailLinkRequestSchema } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { MailIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { LiveRegion } from '@/components/ui/live-region';
import { applyServerErrors } from '@/lib/form-errors';
import { useRequestEmailLink } from '../api/request-email-link';

type FormInput = z.input<typeof EmailLinkRequestSchema>;
type FormOutput = z.output<typeof EmailLinkRequestSchema>;

/** Asks for a sign-in link by e-mail. The answer is the API's neutral notice, whether or not the address is known. */
export function EmailLinkForm({ submitLabel = 'E-mail me a sign-in link', defaultEmail = '' }: { submitLabel?: string; defaultEmail?: string }) {
  const mutation = useRequestEmailLink();
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({ resolver: zodResolver(EmailLinkRequestSchema), defaultValues: { email: defaultEmail } });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setBanner(null);
    try {
      await mutation.mutateAsync(values);
    } catch (error) {
      setBanner(applyServerErrors(error, form.setError, ['email'], 'email').bannerMessage);
    }
  });

  return (
    <form onSubmit={(event) => void onSubmit(event)} noValidate className="flex flex-col gap-3">
      <Field
        label="School e-mail address"
        error={errors.email?.message}
        hint={`The link works once, for ${LIMITS.signInLinkMinutes} minutes.`}
      >
        {(control) => <Input {...control} {...form.register('email')} type="email" autoComplete="email" inputMode="email" mono />}
      </Field>
      <div>
        <Button type="submit" variant="secondary" busy={mutation.isPending}>
          <MailIcon className="size-5" />
          {submitLabel}
        </Button>
      </div>
      <LiveRegion>
        {mutation.isSuccess ? (
          <Banner tone="success" title="Check your inbox">
            {mutation.data.message}
          </Banner>
        ) : null}
      </LiveRegion>
      {banner ? (
        <Banner tone="error" title="The link was not sent">
          {banner}
        </Banner>
      ) : null}
    </form>
  );
}
