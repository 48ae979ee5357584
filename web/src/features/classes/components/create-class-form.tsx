import { ClassCreateSchema } from '@core/contracts';
import { Field } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { PlusIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { OptionField, type NamedOption } from '@/components/ui/option-field';
import { emptyToNull } from '@/lib/empty-to-null';
import { useContractForm } from '@/lib/use-contract-form';
import { useCreateClass } from '../api/create-class';

/** Create a class in a department with its teacher; the API gives it a join code. */
export function CreateClassForm({ departments, teachers }: { departments: NamedOption[]; teachers: NamedOption[] }) {
  const mutation = useCreateClass();
  const { form, onSubmit, banner } = useContractForm({
    schema: ClassCreateSchema,
    defaultValues: { name: '', departmentId: null, teacherId: null },
    serverFields: ['name', 'departmentId', 'teacherId'],
    fallbackField: 'name',
    submit: mutation.mutateAsync,
    resetOnSuccess: true,
  });
  const { errors } = form.formState;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <Field label="Class name" hint="For example “Year 11 Physics, set 2”." error={errors.name?.message}>
        {(control) => <Input {...control} {...form.register('name')} autoComplete="off" />}
      </Field>
      <OptionField
        label="Department"
        error={errors.departmentId?.message}
        emptyLabel="No department"
        options={departments}
        {...form.register('departmentId', { setValueAs: emptyToNull })}
      />
      <OptionField
        label="Teacher"
        hint={teachers.length === 0 ? 'Nobody has the Teacher role yet: invite one first.' : undefined}
        error={errors.teacherId?.message}
        emptyLabel="No teacher yet"
        options={teachers}
        {...form.register('teacherId', { setValueAs: emptyToNull })}
      />
      <FormFooter
        label="Create class"
        icon={PlusIcon}
        busy={mutation.isPending}
        success={
          mutation.isSuccess
            ? {
                title: `Class “${mutation.data.name}” created`,
                body: (
                  <>
                    Its join code is <code className="font-mono font-bold">{mutation.data.joinCode}</code>.
                  </>
                ),
              }
            : null
        }
        errorTitle="The class was not created"
        error={banner}
      />
    </form>
  );
}
