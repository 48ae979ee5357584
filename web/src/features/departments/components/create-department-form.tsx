import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { DepartmentCreateSchema } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { PlusIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { LiveRegion } from '@/components/ui/live-region';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateDepartment } from '../api/create-department';

type FormInput = z.input<typeof DepartmentCreateSchema>;
type FormOutput = z.output<typeof DepartmentCreateSchema>;

export function CreateDepartmentForm() {
  const mutation = useCreateDepartment();
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({ resolver: zodResolver(DepartmentCreateSchema), defaultValues: { name: '' } });

  const onSubmit = form.handleSubmit(async (values) => {
    setBanner(null);
    try {
      await mutation.mutateAsync(values);
      form.reset();
    } catch (error) {
      // A 409 (a department of that name exists) is about the name: show it there.
      setBanner(applyServerErrors(error, form.setError, ['name'], 'name').bannerMessage);
    }
  });

  return (
    <form onSubmit={(event) => void onSubmit(event)} noValidate className="flex flex-col gap-3">
      <Field label="Department name" hint="For example “Physics” or “Science (lower school)”." error={form.formState.errors.name?.message}>
        {(control) => <Input {...control} {...form.register('name')} autoComplete="off" />}
      </Field>
      <div>
        <Button type="submit" busy={mutation.isPending}>
          <PlusIcon className="size-5" />
          Create department
        </Button>
      </div>
      <LiveRegion>{mutation.isSuccess ? <Banner tone="success">Department “{mutation.data.name}” created.</Banner> : null}</LiveRegion>
      {banner ? (
        <Banner tone="error" title="The department was not created">
          {banner}
        </Banner>
      ) : null}
    </form>
  );
}
