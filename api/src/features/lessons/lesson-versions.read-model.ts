import type { Db } from '../../db/knex';
import type { LessonContent, VersionChanges } from '@core/contracts';

/** A published version as the versions list shows it (its content only on request). */
export interface VersionView {
  id: string;
  number: number;
  note: string;
  publishedAt: Date;
  publishedById: string | null;
  publishedByName: string | null;
  checkpointCount: number;
  changes: VersionChanges;
}

export interface VersionDetailView extends VersionView {
  content: LessonContent;
}

const COLUMNS = [
  'v.id',
  'v.number',
  'v.note',
  'v.published_at as publishedAt',
  'v.published_by as publishedById',
  'u.name as publishedByName',
  'v.checkpoint_count as checkpointCount',
  'v.changes',
];

// Callers pass a lesson already loaded for the caller's school: versions are found only through it.
const versionsOf = (db: Db, lessonId: string) =>
  db('lesson_versions as v').leftJoin('users as u', 'u.id', 'v.published_by').where('v.lesson_id', lessonId);

/** A lesson's versions, newest first. */
export async function listVersions(db: Db, lessonId: string): Promise<VersionView[]> {
  return versionsOf(db, lessonId).orderBy('v.number', 'desc').select<VersionView[]>(COLUMNS);
}

/** One version of a lesson with its frozen content. */
export async function findVersion(db: Db, lessonId: string, number: number): Promise<VersionDetailView | undefined> {
  const [row] = await versionsOf(db, lessonId)
    .where('v.number', number)
    .select<VersionDetailView[]>([...COLUMNS, 'v.content'])
    .limit(1);
  return row;
}
