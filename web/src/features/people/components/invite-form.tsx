import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { InvitationCreateSchema } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { MailIcon } from '@/components/ui/icons';
import { Input, Select } from '@/components/ui/input';
import { LiveRegion } from '@/components/ui/live-region';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateInvitation } from '../api/create-invitation';
import { RoleCheckboxes } from './role-checkboxes';

type FormInput = z.input<typeof InvitationCreateSchema>;
type FormOutput = z.output<typeof InvitationCreateSchema>;
type Option = { id: string; name: string };

const FIELDS = ['email', 'name', 'roles', 'departmentId', 'classId'] as const;
const emptyToNull = (value: unknown) => (value === '' ? null : value);

/** Invite one person by e-mail with their roles, and optionally a department and a class. */
export function InviteForm({ departments, classes }: { departments: Option[]; classes: Option[] }) {
  const mutation = useCreateInvitation();
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(InvitationCreateSchema),
    defaultValues: { email: '', name: '', roles: [], departmentId: null, classId: null },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setBanner(null);
    try {
      await mutation.mutateAsync(values);
      form.reset();
    } catch (error) {
      // already_member (409) has no details: it is about the e-mail address.
      setBanner(applyServerErrors(error, form.setError, FIELDS, 'email').bannerMessage);
    }
  });

  return (
    <form onSubmit={(event) => void onSubmit(event)} noValidate className="flex max-w-2xl flex-col gap-5">
      <Field label="E-mail address" hint="Their school address: the invitation and sign-in links go there." error={errors.email?.message}>
        {(control) => <Input {...control} {...form.register('email')} type="email" autoComplete="off" mono />}
      </Field>
      <Field label="Name" hint="As students and colleagues should see it." error={errors.name?.message}>
        {(control) => <Input {...control} {...form.register('name')} autoComplete="off" />}
      </Field>
      <RoleCheckboxes legend="Roles" error={errors.roles?.message} inputProps={() => form.register('roles')} />
      <div className="grid gap-5 sm:grid-cols-2">
        <Field label="Department (optional)" error={errors.departmentId?.message}>
          {(control) => (
            <Select {...control} {...form.register('departmentId', { setValueAs: emptyToNull })}>
              <option value="">No department</option>
              {departments.map((item) => (
                <option key={item.id} value={item.id}>
                  {item.name}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <Field label="Class (optional)" hint="Students are enrolled in it." error={errors.classId?.message}>
          {(control) => (
            <Select {...control} {...form.register('classId', { setValueAs: emptyToNull })}>
              <option value="">No class</option>
              {classes.map((item) => (
                <option key={item.id} value={item.id}>
                  {item.name}
                </option>
              ))}
            </Select>
          )}
        </Field>
      </div>
      <div>
        <Button type="submit" busy={mutation.isPending}>
          <MailIcon className="size-5" />
          Send invitation
        </Button>
      </div>
      <LiveRegion>
        {mutation.isSuccess ? (
          <Banner tone="success" title="Invitation sent">
            {mutation.data.name} ({mutation.data.email}) is invited and appears under People as “Invited” until they first sign in.
          </Banner>
        ) : null}
      </LiveRegion>
      {banner ? (
        <Banner tone="error" title="The invitation was not sent">
          {banner}
        </Banner>
      ) : null}
    </form>
  );
}
