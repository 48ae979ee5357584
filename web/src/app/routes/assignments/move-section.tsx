import { useMemo, useState } from 'react';
import type { AssignmentDto, AssignmentMovedDto, LessonContent } from '@core/contracts';
import { changedAnswerableKeys, moveProblems } from '@core/assignments/version-compat';
import { checkpointLabel } from '@core/lessons/checkpoint-label';
import { diffContent } from '@core/lessons/version-diff';
import { MoveAssignment, MovedSummary, type MovePreview } from '@/features/assignments/components/move-assignment';
import { useVersion } from '@/features/lessons/api/get-versions';
import { describeChanges } from '@/features/lessons/describe-changes';

/** Checkpoint labels by key, from the version moved onto, to name the regraded checkpoints. */
function labelsOf(content: LessonContent | undefined): Record<string, string> {
  return Object.fromEntries((content?.checkpoints ?? []).map((checkpoint) => [checkpoint.key, checkpointLabel(checkpoint)]));
}

/** One line per regraded checkpoint: "Edited “Field at the centre”: expected answer." */
function regradedLines(from: LessonContent, to: LessonContent): string[] {
  const keys = new Set(changedAnswerableKeys(from, to));
  const edited = diffContent(from, to).edited.filter((item) => keys.has(item.key));
  return describeChanges({ added: [], removed: [], edited, chaptersChanged: false, settings: [] });
}

/**
 * "Move to version N" on an assignment page: compares the assignment's version with the lesson's newest
 * one (the lessons feature loads both), then shows what the move did once it is done.
 */
export function MoveSection({ assignment }: { assignment: AssignmentDto }) {
  const [moved, setMoved] = useState<AssignmentMovedDto | null>(null);
  const latest = assignment.lesson.latestVersion;
  const target = latest !== null && latest > assignment.versionNumber ? latest : null;
  const from = useVersion(assignment.lesson.id, target === null ? null : assignment.versionNumber);
  const to = useVersion(assignment.lesson.id, target);
  const fromContent = from.data?.content;
  const toContent = to.data?.content;

  const preview = useMemo<MovePreview>(() => {
    if (from.isError || to.isError) return { state: 'failed', error: from.error ?? to.error };
    if (!fromContent || !toContent) return { state: 'loading' };
    return { state: 'ready', problems: moveProblems(fromContent, toContent), regraded: regradedLines(fromContent, toContent) };
  }, [from.isError, to.isError, from.error, to.error, fromContent, toContent]);
  const [labels, setLabels] = useState<Record<string, string>>({});

  return (
    <div className="flex flex-col gap-4">
      {moved ? <MovedSummary moved={moved} labels={labels} /> : null}
      {target !== null ? (
        <MoveAssignment
          assignment={assignment}
          toVersion={target}
          preview={preview}
          onMoved={(result) => {
            // Keep the names of the regraded checkpoints: the version queries go idle once the move is done.
            setLabels(labelsOf(toContent));
            setMoved(result);
          }}
        />
      ) : moved ? null : (
        <p className="text-ink-muted">
          This class has version {assignment.versionNumber}, the newest published version of the lesson. When you publish a correction, you
          can move the assignment onto it here.
        </p>
      )}
    </div>
  );
}
