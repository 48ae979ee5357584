import { InvitationCreateSchema } from '@core/contracts';
import { Field } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { MailIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { OptionField, type NamedOption } from '@/components/ui/option-field';
import { emptyToNull } from '@/lib/empty-to-null';
import { useContractForm } from '@/lib/use-contract-form';
import { useCreateInvitation } from '../api/create-invitation';
import { RoleCheckboxes } from './role-checkboxes';

const FIELDS = ['email', 'name', 'roles', 'departmentId', 'classId'] as const;

/** Invite one person by e-mail with their roles, and optionally a department and a class. */
export function InviteForm({ departments, classes }: { departments: NamedOption[]; classes: NamedOption[] }) {
  const mutation = useCreateInvitation();
  const { form, onSubmit, banner } = useContractForm({
    schema: InvitationCreateSchema,
    defaultValues: { email: '', name: '', roles: [], departmentId: null, classId: null },
    serverFields: FIELDS,
    // already_member (409) has no details: it is about the e-mail address.
    fallbackField: 'email',
    submit: mutation.mutateAsync,
    resetOnSuccess: true,
  });
  const { errors } = form.formState;

  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-2xl flex-col gap-5">
      <Field label="E-mail address" hint="Their school address: the invitation and sign-in links go there." error={errors.email?.message}>
        {(control) => <Input {...control} {...form.register('email')} type="email" autoComplete="off" mono />}
      </Field>
      <Field label="Name" hint="As students and colleagues should see it." error={errors.name?.message}>
        {(control) => <Input {...control} {...form.register('name')} autoComplete="off" />}
      </Field>
      <RoleCheckboxes legend="Roles" error={errors.roles?.message} inputProps={() => form.register('roles')} />
      <div className="grid gap-5 sm:grid-cols-2">
        <OptionField
          label="Department (optional)"
          error={errors.departmentId?.message}
          emptyLabel="No department"
          options={departments}
          {...form.register('departmentId', { setValueAs: emptyToNull })}
        />
        <OptionField
          label="Class (optional)"
          hint="Students are enrolled in it."
          error={errors.classId?.message}
          emptyLabel="No class"
          options={classes}
          {...form.register('classId', { setValueAs: emptyToNull })}
        />
      </div>
      <FormFooter
        label="Send invitation"
        icon={MailIcon}
        busy={mutation.isPending}
        success={
          mutation.isSuccess
            ? {
                title: 'Invitation sent',
                body: `${mutation.data.name} (${mutation.data.email}) is invited and appears under People as “Invited” until they first sign in.`,
              }
            : null
        }
        errorTitle="The invitation was not sent"
        error={banner}
      />
    </form>
  );
}
