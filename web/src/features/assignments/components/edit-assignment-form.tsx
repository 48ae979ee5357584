import { useState } from 'react';
import { FormProvider } from 'react-hook-form';
import type { AssignmentDto } from '@core/contracts';
import { FormFooter } from '@/components/ui/form-footer';
import { CheckIcon } from '@/components/ui/icons';
import { useContractForm } from '@/lib/use-contract-form';
import { useUpdateAssignment } from '../api/update-assignment';
import { EditFormSchema, POLICY_FIELDS, editValuesOf } from '../form-values';
import { PolicyFields } from './policy-fields';

/** Changes an assignment's dates and policies; the students' answers so far stay as they are. */
export function EditAssignmentForm({ assignment, locale }: { assignment: AssignmentDto; locale: string }) {
  const mutation = useUpdateAssignment(assignment.id);
  const [now] = useState(() => new Date());
  const [saved, setSaved] = useState(false);
  const { form, onSubmit, banner } = useContractForm({
    schema: EditFormSchema,
    defaultValues: editValuesOf(assignment),
    serverFields: POLICY_FIELDS,
    submit: async (body) => {
      setSaved(false);
      const updated = await mutation.mutateAsync(body);
      // The saved assignment becomes the form's new starting point (and what "unchanged" means).
      form.reset(editValuesOf(updated));
      setSaved(true);
    },
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
        <PolicyFields timeZone={assignment.timeZone} locale={locale} now={now} />
        <FormFooter
          label="Save changes"
          icon={CheckIcon}
          busy={mutation.isPending}
          success={
            saved && !form.formState.isDirty ? { title: 'Saved', body: 'Students see the new dates and policies from now on.' } : null
          }
          errorTitle="Not saved"
          error={banner}
        />
      </form>
    </FormProvider>
  );
}
