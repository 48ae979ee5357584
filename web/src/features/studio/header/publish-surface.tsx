import type { VersionSummaryDto } from '@core/contracts';
import { usePublishLesson } from '@/features/lessons/api/publish-lesson';
import type { StudioDraft } from '../draft/use-studio-draft';
import type { Selection } from '../panel/problems-list';
import { PublishDialog } from './publish-dialog';

type PublishSurfaceProps = {
  open: boolean;
  onClose: () => void;
  lessonId: string;
  draft: StudioDraft;
  nextVersion: number;
  onPublished: (version: VersionSummaryDto) => void;
  onSelect: (target: Selection) => void;
};

/** Publishing from the studio: unsaved edits are saved first, then exactly that revision is published. */
export function PublishSurface({ open, onClose, lessonId, draft, nextVersion, onPublished, onSelect }: PublishSurfaceProps) {
  const mutation = usePublishLesson(lessonId);
  async function publish(note: string) {
    const saved = await draft.autosave.flush();
    if (!saved) {
      throw new Error(
        'Your latest edits are not saved yet, so publishing waits. The saving state at the top says why; publish once they are saved.',
      );
    }
    const version = await mutation.mutateAsync({ revision: draft.autosave.currentRevision, note });
    draft.markPublished();
    return version;
  }
  return (
    <PublishDialog
      open={open}
      onClose={onClose}
      content={draft.content}
      problems={draft.problems}
      nextVersion={nextVersion}
      publish={publish}
      onPublished={onPublished}
      onSelect={onSelect}
    />
  );
}
