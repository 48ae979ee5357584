import { useEffect, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { RecordingUpdateSchema, type RecordingDto } from '@core/contracts';
import { Button } from '@/components/ui/button';
import { Banner } from '@/components/ui/banner';
import { Field } from '@/components/ui/field';
import { Input } from '@/components/ui/input';
import { paths } from '@/config/paths';
import { useContractForm } from '@/lib/use-contract-form';
import { useUpdateRecording } from '../api/update-recording';

type RecordingTitleProps = { recording: RecordingDto; as?: 'link' | 'heading' };

/** The title, a link to the recording, with an inline rename for those who may edit it. */
export function RecordingTitle({ recording, as = 'link' }: RecordingTitleProps) {
  const [editing, setEditing] = useState(false);
  const renameRef = useRef<HTMLButtonElement>(null);
  const returnFocus = useRef(false);

  useEffect(() => {
    // Back on the Rename button after saving or cancelling, not lost at the top of the page.
    if (!editing && returnFocus.current) {
      returnFocus.current = false;
      renameRef.current?.focus();
    }
  }, [editing]);

  if (editing) {
    const form = (
      <TitleForm
        recording={recording}
        onDone={() => {
          returnFocus.current = true;
          setEditing(false);
        }}
      />
    );
    // The page keeps its heading while the title is being edited.
    return as === 'heading' ? (
      <div className="flex flex-col gap-3">
        <h1 className="text-3xl break-words">{recording.title}</h1>
        {form}
      </div>
    ) : (
      form
    );
  }
  return (
    <div className="flex flex-wrap items-baseline gap-x-2">
      {as === 'link' ? (
        <Link to={paths.teacher.recording(recording.id)} className="font-bold text-ink underline decoration-line-strong underline-offset-2">
          {recording.title}
        </Link>
      ) : (
        <h1 className="text-3xl break-words">{recording.title}</h1>
      )}
      {recording.canEdit ? (
        // A plain button: the Button component takes no ref, and focus must come back here.
        <button
          ref={renameRef}
          type="button"
          onClick={() => setEditing(true)}
          aria-label={`Rename ${recording.title}`}
          className="cursor-pointer text-sm font-bold text-copper underline"
        >
          Rename
        </button>
      ) : null}
    </div>
  );
}

function TitleForm({ recording, onDone }: { recording: RecordingDto; onDone: () => void }) {
  const mutation = useUpdateRecording();
  const { form, onSubmit, banner } = useContractForm({
    schema: RecordingUpdateSchema,
    defaultValues: { title: recording.title },
    serverFields: ['title'],
    fallbackField: 'title',
    submit: async (values) => {
      await mutation.mutateAsync({ recordingId: recording.id, ...values });
      onDone();
    },
  });
  const { errors } = form.formState;
  useEffect(() => {
    form.setFocus('title', { shouldSelect: true });
  }, [form]);

  return (
    <form onSubmit={onSubmit} noValidate className="flex w-full flex-col gap-2 sm:min-w-64">
      <Field label={`New title for ${recording.title}`} error={errors.title?.message}>
        {(control) => (
          <Input
            {...control}
            {...form.register('title')}
            autoComplete="off"
            onKeyDown={(event) => {
              if (event.key === 'Escape') {
                event.preventDefault();
                onDone();
              }
            }}
          />
        )}
      </Field>
      <div className="flex gap-2">
        <Button type="submit" size="sm" busy={mutation.isPending}>
          Save title
        </Button>
        <Button size="sm" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
      {banner ? <Banner tone="error">{banner}</Banner> : null}
    </form>
  );
}
