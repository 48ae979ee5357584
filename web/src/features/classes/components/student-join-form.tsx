import { StudentJoinSchema } from '@core/contracts';
import { ClassCodeField } from '@/components/ui/class-code-field';
import { FormFooter } from '@/components/ui/form-footer';
import { useContractForm } from '@/lib/use-contract-form';
import { useJoinClass } from '../api/join-class';

/** A signed-in student enters a class code; the class then shows in their list. */
export function StudentJoinForm() {
  const mutation = useJoinClass();
  const { form, onSubmit, banner } = useContractForm({
    schema: StudentJoinSchema,
    defaultValues: { code: '' },
    serverFields: ['code'],
    // "No class has that code" and "already in this class" belong next to the code.
    fallbackField: 'code',
    submit: mutation.mutateAsync,
    resetOnSuccess: true,
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3">
      <ClassCodeField error={form.formState.errors.code?.message} {...form.register('code')} />
      <FormFooter
        label="Join class"
        busy={mutation.isPending}
        success={mutation.isSuccess ? { title: `You joined ${mutation.data.name}`, body: 'It is now in your list of classes.' } : null}
        errorTitle="You did not join a class"
        error={banner}
      />
    </form>
  );
}
