import { EmailLinkRequestSchema } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { Field } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { MailIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { useContractForm } from '@/lib/use-contract-form';
import { useRequestEmailLink } from '../api/request-email-link';

/** Asks for a sign-in link by e-mail. The answer is the API's neutral notice, whether or not the address is known. */
export function EmailLinkForm({
  submitLabel = 'E-mail me a sign-in link',
  defaultEmail = '',
}: {
  submitLabel?: string;
  defaultEmail?: string;
}) {
  const mutation = useRequestEmailLink();
  const { form, onSubmit, banner } = useContractForm({
    schema: EmailLinkRequestSchema,
    defaultValues: { email: defaultEmail },
    serverFields: ['email'],
    fallbackField: 'email',
    submit: mutation.mutateAsync,
  });
  const { errors } = form.formState;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <Field
        label="School e-mail address"
        error={errors.email?.message}
        hint={`The link works once, for ${LIMITS.signInLinkMinutes} minutes.`}
      >
        {(control) => <Input {...control} {...form.register('email')} type="email" autoComplete="email" inputMode="email" mono />}
      </Field>
      <FormFooter
        label={submitLabel}
        icon={MailIcon}
        variant="secondary"
        busy={mutation.isPending}
        success={mutation.isSuccess ? { title: 'Check your inbox', body: mutation.data.message } : null}
        errorTitle="The link was not sent"
        error={banner}
      />
    </form>
  );
}
