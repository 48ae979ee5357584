import {
  CHECKPOINT_KIND_LABELS,
  CHECKPOINT_KINDS,
  type CheckpointKind,
  type LessonContent,
  type LessonState,
  type LessonSummaryDto,
} from '@core/contracts';
import { plural } from '@/lib/format';

export const LESSON_STATE_LABELS: Record<LessonState, string> = {
  draft: 'Draft',
  published: 'Published',
  archived: 'Archived',
};

/** "v3", "v3 · unpublished changes", or "Never published". */
export function versionText(lesson: Pick<LessonSummaryDto, 'publishedVersion' | 'unpublishedChanges'>): string {
  if (lesson.publishedVersion === null) return 'Never published';
  return lesson.unpublishedChanges ? `v${lesson.publishedVersion} · unpublished changes` : `v${lesson.publishedVersion}`;
}

/** How many checkpoints of each kind, in the kinds' own order, leaving out kinds not used. */
export function checkpointsByKind(content: LessonContent): { kind: CheckpointKind; label: string; count: number }[] {
  return CHECKPOINT_KINDS.map((kind) => ({
    kind,
    label: CHECKPOINT_KIND_LABELS[kind],
    count: content.checkpoints.filter((checkpoint) => checkpoint.kind === kind).length,
  })).filter((row) => row.count > 0);
}

export function checkpointCountText(count: number): string {
  return count === 0 ? 'No checkpoints yet' : plural(count, 'checkpoint');
}
