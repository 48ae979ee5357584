import { DepartmentCreateSchema } from '@core/contracts';
import { Field } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { PlusIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { useContractForm } from '@/lib/use-contract-form';
import { useCreateDepartment } from '../api/create-department';

export function CreateDepartmentForm() {
  const mutation = useCreateDepartment();
  const { form, onSubmit, banner } = useContractForm({
    schema: DepartmentCreateSchema,
    defaultValues: { name: '' },
    serverFields: ['name'],
    // A 409 (a department of that name exists) is about the name: show it there.
    fallbackField: 'name',
    submit: mutation.mutateAsync,
    resetOnSuccess: true,
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <Field label="Department name" hint="For example “Physics” or “Science (lower school)”." error={form.formState.errors.name?.message}>
        {(control) => <Input {...control} {...form.register('name')} autoComplete="off" />}
      </Field>
      <FormFooter
        label="Create department"
        icon={PlusIcon}
        busy={mutation.isPending}
        success={mutation.isSuccess ? { body: `Department “${mutation.data.name}” created.` } : null}
        errorTitle="The department was not created"
        error={banner}
      />
    </form>
  );
}
