import { useMemo, useState } from 'react';
import { FormProvider, useWatch } from 'react-hook-form';
import type { AssignmentCreatedDto } from '@core/contracts';
import { Field } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { CheckIcon } from '@/components/ui/icons';
import { Select } from '@/components/ui/input';
import { formatDate, plural, type SchoolClock } from '@/lib/format';
import { useContractForm } from '@/lib/use-contract-form';
import { useCreateAssignments } from '../api/create-assignments';
import { ASSIGN_FIELDS, assignFormSchema, newAssignValues } from '../form-values';
import { ClassCheckboxes, type ClassChoice } from './class-checkboxes';
import { PolicyFields } from './policy-fields';

export type VersionChoice = { number: number; publishedAt: string; note: string };

type AssignFormProps = {
  lessonId: string;
  /** Published versions, newest first. */
  versions: VersionChoice[];
  classes: ClassChoice[];
  clock: SchoolClock;
  onCreated: (created: AssignmentCreatedDto) => void;
};

function versionOption(version: VersionChoice, newest: boolean, clock: SchoolClock): string {
  const note = version.note.trim() === '' ? '' : ` · ${version.note.trim()}`;
  return `Version ${version.number}${newest ? ' (newest)' : ''}, published ${formatDate(version.publishedAt, clock)}${note}`;
}

/** Assigns a published version of a lesson to some of the teacher's classes, with dates in school time and the policies. */
export function AssignForm({ lessonId, versions, classes, clock, onCreated }: AssignFormProps) {
  const mutation = useCreateAssignments();
  // The defaults are taken once, when the form opens: "now" must not move under the teacher's typing.
  const [now] = useState(() => new Date());
  const schema = useMemo(() => assignFormSchema(lessonId), [lessonId]);
  const { form, onSubmit, banner } = useContractForm({
    schema,
    defaultValues: newAssignValues({
      newestVersion: versions[0]?.number ?? null,
      // A teacher with one class almost always means that class.
      classIds: classes.length === 1 && classes[0] ? [classes[0].id] : [],
      now,
      timeZone: clock.timeZone,
    }),
    serverFields: ASSIGN_FIELDS,
    submit: async (body) => onCreated(await mutation.mutateAsync(body)),
  });
  const { errors } = form.formState;
  const chosen = useWatch({ control: form.control, name: 'classIds' }).length;

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
        <Field
          label="Version"
          hint="Students answer this version. If you publish a correction later, you can move the assignment onto it."
          error={errors.versionNumber?.message}
        >
          {(control) => (
            <Select {...control} {...form.register('versionNumber')}>
              {versions.map((version, index) => (
                <option key={version.number} value={String(version.number)}>
                  {versionOption(version, index === 0, clock)}
                </option>
              ))}
            </Select>
          )}
        </Field>
        <ClassCheckboxes classes={classes} />
        <PolicyFields timeZone={clock.timeZone} locale={clock.locale} now={now} />
        <FormFooter
          label={chosen > 1 ? `Assign to ${plural(chosen, 'class', 'classes')}` : 'Assign'}
          icon={CheckIcon}
          busy={mutation.isPending}
          success={null}
          errorTitle="Not assigned"
          error={banner}
        />
      </form>
    </FormProvider>
  );
}
