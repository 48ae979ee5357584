import { useState } from 'react';
import { PublishSchema, type LessonContent, type VersionSummaryDto } from '@core/contracts';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Textarea } from '@/components/ui/input';
import { isApiError } from '@/lib/api-client';
import { countProblems, groupProblems, type GroupedProblems } from '../draft/problems';
import { ProblemsList, type Selection } from '../panel/problems-list';
import { StudioDialog } from '../ui/studio-dialog';

type PublishDialogProps = {
  open: boolean;
  onClose: () => void;
  content: LessonContent;
  problems: GroupedProblems;
  nextVersion: number;
  /** Saves what is not saved yet and publishes that revision; throws the API's refusal. */
  publish: (note: string) => Promise<VersionSummaryDto>;
  onPublished: (version: VersionSummaryDto) => void;
  onSelect: (target: Selection) => void;
};

/** Publishing freezes the saved draft as the next version; a draft with problems is refused with the list. */
export function PublishDialog({ open, onClose, content, problems, nextVersion, publish, onPublished, onSelect }: PublishDialogProps) {
  const [note, setNote] = useState('');
  const [noteError, setNoteError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const [refused, setRefused] = useState<GroupedProblems | null>(null);
  const shown = refused ?? problems;
  const blocked = countProblems(shown) > 0;

  async function confirm() {
    const parsed = PublishSchema.shape.note.safeParse(note);
    if (!parsed.success) {
      setNoteError(parsed.error.issues[0]?.message ?? 'This note cannot be used.');
      return;
    }
    setNoteError(null);
    setFailure(null);
    setBusy(true);
    try {
      const version = await publish(parsed.data);
      setNote('');
      setRefused(null);
      onPublished(version);
    } catch (error) {
      if (isApiError(error) && error.code === 'lesson_not_ready') setRefused(groupProblems(content, error.details));
      else if (isApiError(error) && error.code === 'nothing_to_publish')
        setFailure('Nothing changed since the last version, so there is nothing new to publish.');
      else if (isApiError(error) && error.status === 409)
        setFailure('A newer draft was saved in another tab or by someone else: check it, then publish again.');
      else setFailure(error instanceof Error ? error.message : 'Publishing failed. Try again.');
    } finally {
      setBusy(false);
    }
  }

  // A refusal describes the draft as it was: closing forgets it, the next try asks the server again.
  function close() {
    setRefused(null);
    setFailure(null);
    onClose();
  }

  return (
    <StudioDialog
      open={open}
      title={`Publish version ${nextVersion}`}
      onClose={close}
      footer={
        <>
          <Button variant="secondary" onClick={close} disabled={busy}>
            Not now
          </Button>
          <Button onClick={() => void confirm()} busy={busy} disabled={blocked}>
            Publish version {nextVersion}
          </Button>
        </>
      }
    >
      <div className="flex flex-col gap-4">
        <p className="text-ink-muted">
          Students assigned this lesson later get version {nextVersion}; answers already given stay with the version they answered. The
          draft stays open for more edits.
        </p>
        {blocked ? (
          <Banner tone="error" title={refused ? 'Not published: fix these first' : 'Fix these before publishing'}>
            <ProblemsList
              content={content}
              problems={shown}
              onSelect={(target) => {
                close();
                onSelect(target);
              }}
            />
          </Banner>
        ) : null}
        <Field label="Note for this version" hint="Optional: what changed and why (students do not see it)." error={noteError ?? undefined}>
          {(control) => <Textarea {...control} rows={3} value={note} onChange={(event) => setNote(event.target.value)} />}
        </Field>
        {failure ? (
          <Banner tone="error" title="Not published">
            {failure}
          </Banner>
        ) : null}
      </div>
    </StudioDialog>
  );
}
