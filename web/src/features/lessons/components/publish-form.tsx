import { useState } from 'react';
import { PublishSchema, type LessonDto, type LessonProblem, type VersionSummaryDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Field } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { CheckIcon } from '@/components/ui/icons';
import { Textarea } from '@/components/ui/input';
import { isApiError } from '@/lib/api-client';
import { plural } from '@/lib/format';
import { useContractForm } from '@/lib/use-contract-form';
import { usePublishLesson } from '../api/publish-lesson';
import { ProblemList } from './problem-list';

const NoteSchema = PublishSchema.pick({ note: true });

/**
 * Publishes the saved draft as the next version, with an optional note for colleagues. The server refuses a
 * draft with problems (lesson_not_ready): they are listed with links to where the studio fixes them.
 */
export function PublishForm({ lesson }: { lesson: LessonDto }) {
  const mutation = usePublishLesson(lesson.id);
  const [refused, setRefused] = useState<LessonProblem[] | null>(null);
  const [published, setPublished] = useState<VersionSummaryDto | null>(null);
  const { form, onSubmit, banner } = useContractForm({
    schema: NoteSchema,
    defaultValues: { note: '' },
    serverFields: ['note'],
    resetOnSuccess: true,
    submit: async ({ note }) => {
      setRefused(null);
      setPublished(null);
      try {
        setPublished(await mutation.mutateAsync({ revision: lesson.revision, note }));
      } catch (error) {
        if (isApiError(error) && error.code === 'lesson_not_ready') {
          setRefused(error.details);
          return;
        }
        throw error;
      }
    },
  });
  const { errors } = form.formState;
  // The refusal is the server's latest word; before any attempt, the problems the last save reported.
  const problems = refused ?? lesson.problems;
  const upToDate = lesson.publishedVersion !== null && !lesson.unpublishedChanges;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {upToDate && !published ? (
        <p className="text-ink-muted">
          Version {lesson.publishedVersion} is up to date: edit the lesson in the studio to publish a new one.
        </p>
      ) : null}
      {problems.length > 0 ? (
        <Banner
          tone="error"
          title={refused ? 'Not published: fix these first' : `${plural(problems.length, 'problem')} to fix before publishing`}
        >
          <ProblemList
            lessonId={lesson.id}
            problems={problems}
            content={lesson.draft}
            canEdit={lesson.canEdit}
            label="Problems to fix before publishing"
          />
        </Banner>
      ) : null}
      {upToDate && !published ? null : (
        <>
          <Field
            label="Note for this version"
            hint="Optional: what changed and why, for you and your colleagues (students do not see it)."
            error={errors.note?.message}
          >
            {(control) => <Textarea {...control} {...form.register('note')} rows={2} />}
          </Field>
          <FormFooter
            label={lesson.publishedVersion === null ? 'Publish version 1' : `Publish version ${lesson.publishedVersion + 1}`}
            icon={CheckIcon}
            busy={mutation.isPending}
            success={
              published
                ? {
                    title: `Version ${published.number} published`,
                    body: `${plural(published.checkpointCount, 'checkpoint')}; the versions list below shows what changed.`,
                  }
                : null
            }
            errorTitle="Not published"
            error={banner}
          />
        </>
      )}
    </form>
  );
}
