import { useId, useRef, useState } from 'react';
import { CaptionCreateSchema, type CaptionDto } from '@core/contracts';
import { ErrorBanner } from '@/components/ui/error-banner';
import { Field, FieldError } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { UploadIcon } from '@/components/ui/icons';
import { Input } from '@/components/ui/input';
import { isApiError, type ApiError } from '@/lib/api-client';
import { plural } from '@/lib/format';
import { useContractForm } from '@/lib/use-contract-form';
import { useCreateCaption } from '../api/create-caption';

/** Adds a WebVTT file as captions in one language; the API's line-numbered problems are listed if it is not valid. */
export function CaptionForm({ recordingId }: { recordingId: string }) {
  const fileId = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [cueProblems, setCueProblems] = useState<ApiError | null>(null);
  const [added, setAdded] = useState<CaptionDto | null>(null);
  const mutation = useCreateCaption(recordingId);
  const { form, onSubmit, banner } = useContractForm({
    schema: CaptionCreateSchema,
    defaultValues: { language: '', label: '', isDefault: false, vtt: '' },
    serverFields: ['language', 'label', 'isDefault', 'vtt'],
    submit: async (values) => {
      setCueProblems(null);
      setAdded(null);
      try {
        const caption = await mutation.mutateAsync(values);
        setAdded(caption);
        form.reset();
        if (fileRef.current) fileRef.current.value = '';
      } catch (error) {
        // The file's own problems, each with its line: listed under the form rather than on one field.
        if (isApiError(error) && error.code === 'caption_invalid') {
          setCueProblems(error);
          return;
        }
        throw error;
      }
    },
  });
  const { errors } = form.formState;

  async function chooseFile(file: File | undefined) {
    setCueProblems(null);
    form.setValue('vtt', file ? await file.text() : '', { shouldValidate: form.formState.isSubmitted });
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Language tag" hint="Such as en, en-GB, fr or pt-BR." error={errors.language?.message}>
          {(control) => <Input {...control} {...form.register('language')} autoComplete="off" spellCheck={false} mono />}
        </Field>
        <Field label="Label" hint="What viewers see in the captions menu, such as English." error={errors.label?.message}>
          {(control) => <Input {...control} {...form.register('label')} autoComplete="off" />}
        </Field>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={fileId} className="font-bold">
          WebVTT file
        </label>
        <input
          ref={fileRef}
          id={fileId}
          type="file"
          accept=".vtt,text/vtt"
          aria-invalid={errors.vtt ? true : undefined}
          aria-describedby={errors.vtt ? `${fileId}-error` : undefined}
          onChange={(event) => void chooseFile(event.target.files?.[0])}
          className="max-w-full text-base file:mr-3 file:min-h-11 file:cursor-pointer file:rounded-md file:border file:border-line-strong file:bg-surface file:px-4 file:font-bold file:text-ink"
        />
        <FieldError id={`${fileId}-error`} message={errors.vtt?.message} />
      </div>
      <label className="flex items-center gap-2">
        <input type="checkbox" {...form.register('isDefault')} className="size-5 accent-teal" />
        <span>Show these captions first</span>
      </label>
      {cueProblems ? <ErrorBanner error={cueProblems} title="The caption file has problems" /> : null}
      <FormFooter
        label="Add captions"
        icon={UploadIcon}
        busy={mutation.isPending}
        success={
          added ? { title: `Captions “${added.label}” added`, body: `${plural(added.cueCount, 'cue')} in ${added.language}.` } : null
        }
        errorTitle="The captions were not added"
        error={banner}
      />
    </form>
  );
}
