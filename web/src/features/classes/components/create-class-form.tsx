import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { ClassCreateSchema } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { PlusIcon } from '@/components/ui/icons';
import { Input, Select } from '@/components/ui/input';
import { LiveRegion } from '@/components/ui/live-region';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateClass } from '../api/create-class';

type FormInput = z.input<typeof ClassCreateSchema>;
type FormOutput = z.output<typeof ClassCreateSchema>;
type Option = { id: string; name: string };

const emptyToNull = (value: unknown) => (value === '' ? null : value);

/** Create a class in a department with its teacher; the API gives it a join code. */
export function CreateClassForm({ departments, teachers }: { departments: Option[]; teachers: Option[] }) {
  const mutation = useCreateClass();
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(ClassCreateSchema),
    defaultValues: { name: '', departmentId: null, teacherId: null },
  });
  const { errors } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setBanner(null);
    try {
      await mutation.mutateAsync(values);
      form.reset();
    } catch (error) {
      setBanner(applyServerErrors(error, form.setError, ['name', 'departmentId', 'teacherId'], 'name').bannerMessage);
    }
  });

  return (
    <form onSubmit={(event) => void onSubmit(event)} noValidate className="flex flex-col gap-4">
      <Field label="Class name" hint="For example “Year 11 Physics, set 2”." error={errors.name?.message}>
        {(control) => <Input {...control} {...form.register('name')} autoComplete="off" />}
      </Field>
      <Field label="Department" error={errors.departmentId?.message}>
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
      <Field
        label="Teacher"
        hint={teachers.length === 0 ? 'Nobody has the Teacher role yet: invite one first.' : undefined}
        error={errors.teacherId?.message}
      >
        {(control) => (
          <Select {...control} {...form.register('teacherId', { setValueAs: emptyToNull })}>
            <option value="">No teacher yet</option>
            {teachers.map((item) => (
              <option key={item.id} value={item.id}>
                {item.name}
              </option>
            ))}
          </Select>
        )}
      </Field>
      <div>
        <Button type="submit" busy={mutation.isPending}>
          <PlusIcon className="size-5" />
          Create class
        </Button>
      </div>
      <LiveRegion>
        {mutation.isSuccess ? (
          <Banner tone="success" title={`Class “${mutation.data.name}” created`}>
            Its join code is <code className="font-mono font-bold">{mutation.data.joinCode}</code>.
          </Banner>
        ) : null}
      </LiveRegion>
      {banner ? (
        <Banner tone="error" title="The class was not created">
          {banner}
        </Banner>
      ) : null}
    </form>
  );
}
