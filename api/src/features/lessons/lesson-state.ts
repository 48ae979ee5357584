import type { LessonState } from '@core/contracts';

/** A lesson's state from its stored facts: archived wins, then published once a version exists. */
export function lessonStateOf(row: { archivedAt: Date | string | null; latestVersion: number | null }): LessonState {
  if (row.archivedAt) return 'archived';
  return row.latestVersion !== null ? 'published' : 'draft';
}
