import { Controller, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { LIMITS } from '@core/limits';
import { IdSchema, LessonCreateSchema, type LessonDto } from '@core/contracts';
import { MarkdownField } from '@/components/rich-text/markdown-field';
import { Field } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { PlusIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { useContractForm } from '@/lib/use-contract-form';
import { useCreateLesson } from '../api/create-lesson';
import { RecordingSelect, type RecordingChoice } from './recording-select';
import { appendCaution, SafetySuggestions } from './safety-suggestions';
import { TagInput } from './tag-input';

// The contract, with a plain sentence for the empty recording choice (the API still checks the id).
const CreateFormSchema = LessonCreateSchema.extend({
  recordingId: z.string().min(1, { error: 'Choose the recording the lesson is built on.' }).pipe(IdSchema),
});

const SERVER_FIELDS = ['recordingId', 'title', 'description', 'tags', 'level', 'safetyNotes'] as const;

type LessonCreateFormProps = {
  recordings: RecordingChoice[];
  /** From `?recording=`: chosen already when it is one of the ready recordings. */
  initialRecordingId: string | null;
  onCreated: (lesson: LessonDto) => void;
};

/** A new lesson's recording and settings; the checkpoints are pinned afterwards in the studio. */
export function LessonCreateForm({ recordings, initialRecordingId, onCreated }: LessonCreateFormProps) {
  const mutation = useCreateLesson();
  const preselected = recordings.some((recording) => recording.id === initialRecordingId) ? (initialRecordingId ?? '') : '';
  const { form, onSubmit, banner } = useContractForm({
    schema: CreateFormSchema,
    defaultValues: { recordingId: preselected, title: '', tags: [], level: '', description: '', safetyNotes: '' },
    serverFields: SERVER_FIELDS,
    // recording_not_ready and other refusals without details are about the chosen recording.
    fallbackField: 'recordingId',
    submit: async (values) => onCreated(await mutation.mutateAsync(values)),
  });
  const { errors } = form.formState;
  const [title, tags, description, safetyNotes] = useWatch({
    control: form.control,
    name: ['title', 'tags', 'description', 'safetyNotes'],
  });
  const tagError = errors.tags?.message ?? (Array.isArray(errors.tags) ? errors.tags.find((item) => item?.message)?.message : undefined);

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <RecordingSelect
        recordings={recordings}
        hint="Only recordings that finished processing can carry a lesson."
        error={errors.recordingId?.message}
        {...form.register('recordingId')}
      />
      <Field label="Title" hint="What students and colleagues see in their lists." error={errors.title?.message}>
        {(control) => <Input {...control} {...form.register('title')} autoComplete="off" />}
      </Field>
      <div className="grid gap-5 sm:grid-cols-2">
        <Field label="Topic tags" hint="Type a tag and press Enter or a comma, such as “induction”." error={tagError}>
          {(control) => (
            <Controller
              control={form.control}
              name="tags"
              render={({ field }) => <TagInput {...control} value={field.value} onChange={field.onChange} onBlur={field.onBlur} />}
            />
          )}
        </Field>
        <Field label="Level" hint="Optional, such as “Year 10” or “Introductory college”." error={errors.level?.message}>
          {(control) => <Input {...control} {...form.register('level')} autoComplete="off" />}
        </Field>
      </div>
      <Controller
        control={form.control}
        name="description"
        render={({ field }) => (
          <MarkdownField
            label="Description"
            hint="Optional: what the demonstration shows and what students should notice."
            value={field.value}
            onChange={field.onChange}
            onBlur={field.onBlur}
            error={errors.description?.message}
            maxLength={LIMITS.lessonDescriptionMax}
          />
        )}
      />
      <SafetySuggestions
        title={title}
        tags={tags}
        description={description}
        safetyNotes={safetyNotes}
        onAdd={(text) =>
          form.setValue('safetyNotes', appendCaution(form.getValues('safetyNotes'), text), {
            shouldDirty: true,
            shouldValidate: form.formState.isSubmitted,
          })
        }
      />
      <Controller
        control={form.control}
        name="safetyNotes"
        render={({ field }) => (
          <MarkdownField
            label="Safety notes"
            hint="Shown to students before the video starts."
            value={field.value}
            onChange={field.onChange}
            onBlur={field.onBlur}
            error={errors.safetyNotes?.message}
            maxLength={LIMITS.safetyNotesMax}
          />
        )}
      />
      <FormFooter
        label="Create the lesson"
        icon={PlusIcon}
        busy={mutation.isPending}
        success={null}
        errorTitle="The lesson was not created"
        error={banner}
      />
    </form>
  );
}
