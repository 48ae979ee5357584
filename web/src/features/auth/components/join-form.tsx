import { JoinClassRequestSchema } from '@core/contracts';
import { ClassCodeField } from '@/components/ui/class-code-field';
import { Field } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Input } from '@/components/ui/input';
import { useContractForm } from '@/lib/use-contract-form';
import { useJoinByCode } from '../api/join-by-code';

/** A student without an account asks to join a class by its code; a join link arrives by e-mail if the school allows it. */
export function JoinForm() {
  const mutation = useJoinByCode();
  const { form, onSubmit, banner } = useContractForm({
    schema: JoinClassRequestSchema,
    defaultValues: { code: '', email: '', name: '' },
    serverFields: ['code', 'email', 'name'],
    submit: mutation.mutateAsync,
  });
  const { errors } = form.formState;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <ClassCodeField error={errors.code?.message} {...form.register('code')} />
      <Field label="Your name" hint="As your teacher should see it." error={errors.name?.message}>
        {(control) => <Input {...control} {...form.register('name')} autoComplete="name" />}
      </Field>
      <Field label="Your school e-mail address" error={errors.email?.message}>
        {(control) => <Input {...control} {...form.register('email')} type="email" autoComplete="email" inputMode="email" mono />}
      </Field>
      <FormFooter
        label="Ask to join"
        busy={mutation.isPending}
        success={mutation.isSuccess ? { title: 'Request received', body: mutation.data.message } : null}
        errorTitle="The request was not sent"
        error={banner}
      />
    </form>
  );
}
