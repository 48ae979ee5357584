import { useId, useState } from 'react';
import { LIMITS } from '@core/limits';
import { z } from 'zod';
import { IdSchema, LessonImportSchema, type LessonDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { FieldError } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { UploadIcon } from '@/components/ui/icons';
import { isApiError, type ApiErrorDetail } from '@/lib/api-client';
import { useContractForm } from '@/lib/use-contract-form';
import { useImportLesson } from '../api/import-lesson';
import { RecordingSelect, type RecordingChoice } from './recording-select';

// The contract, plus the two things a form must say before sending: which recording, and which file.
const ImportFormSchema = LessonImportSchema.extend({
  recordingId: z.string().min(1, { error: 'Choose the recording the lesson goes on.' }).pipe(IdSchema),
  text: z.string().min(1, { error: 'Choose a lesson file.' }).pipe(LessonImportSchema.shape.text),
});

type ImportLessonFormProps = {
  recordings: RecordingChoice[];
  /** Called with the new draft lesson (the page opens it in the studio). */
  onImported: (lesson: LessonDto) => void;
};

/** A lesson file (.json) read in the browser and sent with the recording it goes on; its problems are listed by line. */
export function ImportLessonForm({ recordings, onImported }: ImportLessonFormProps) {
  const fileId = useId();
  const [fileProblems, setFileProblems] = useState<{ message: string; details: ApiErrorDetail[] } | null>(null);
  const mutation = useImportLesson();
  const { form, onSubmit, banner } = useContractForm({
    schema: ImportFormSchema,
    defaultValues: { recordingId: '', fileName: '', text: '' },
    serverFields: ['recordingId', 'fileName', 'text'],
    fallbackField: 'recordingId',
    submit: async (values) => {
      setFileProblems(null);
      try {
        onImported(await mutation.mutateAsync(values));
      } catch (error) {
        // The file's own problems, each naming its line: a list under the file, not one field message.
        if (isApiError(error) && error.code === 'lesson_file_invalid') {
          setFileProblems({ message: error.message, details: error.details });
          return;
        }
        throw error;
      }
    },
  });
  const { errors } = form.formState;
  const fileError = errors.text?.message ?? errors.fileName?.message;

  async function chooseFile(file: File | undefined) {
    setFileProblems(null);
    const validate = { shouldValidate: form.formState.isSubmitted };
    if (!file) {
      form.setValue('fileName', '', validate);
      form.setValue('text', '', validate);
      return;
    }
    if (file.size > LIMITS.lessonFileBytesMax) {
      form.setValue('text', '');
      form.setError('text', {
        type: 'size',
        message: `“${file.name}” is ${Math.ceil(file.size / 1024)} KiB; a lesson file is at most ${LIMITS.lessonFileBytesMax / 1024} KiB.`,
      });
      return;
    }
    form.setValue('fileName', file.name.slice(0, LIMITS.fileNameMax), validate);
    form.setValue('text', await file.text(), validate);
    form.clearErrors('text');
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <RecordingSelect
        recordings={recordings}
        hint="The lesson file holds the checkpoints, not the video: choose the recording they go on."
        error={errors.recordingId?.message}
        {...form.register('recordingId')}
      />
      <div className="flex flex-col gap-1">
        <label htmlFor={fileId} className="font-bold">
          Lesson file
        </label>
        <p className="text-sm text-ink-muted">A .json file exported from Pinfield (a name ending in .pinfield-lesson.json).</p>
        <input
          id={fileId}
          type="file"
          accept=".json,application/json"
          aria-invalid={fileError ? true : undefined}
          aria-describedby={fileError ? `${fileId}-error` : undefined}
          onChange={(event) => void chooseFile(event.target.files?.[0])}
          className="max-w-full text-base file:mr-3 file:min-h-11 file:cursor-pointer file:rounded-md file:border file:border-line-strong file:bg-surface file:px-4 file:font-bold file:text-ink"
        />
        <FieldError id={`${fileId}-error`} message={fileError} />
      </div>
      {fileProblems ? (
        <Banner tone="error" title="The lesson file has problems; nothing was imported">
          <p>{fileProblems.message}</p>
          {fileProblems.details.length > 0 ? (
            <ul aria-label="Problems in the lesson file" className="mt-1 list-disc pl-5">
              {fileProblems.details.map((detail) => (
                <li key={`${detail.path}:${detail.message}`}>
                  <span className="font-bold">{detail.path}</span>: {detail.message}
                </li>
              ))}
            </ul>
          ) : null}
        </Banner>
      ) : null}
      <FormFooter
        label="Import lesson"
        icon={UploadIcon}
        busy={mutation.isPending}
        success={null}
        errorTitle="The lesson was not imported"
        error={banner}
      />
    </form>
  );
}
