import type { Db } from '../../db/knex';
import type { Actor } from '../../auth/actor';
import type { LessonContent, LessonListQuery } from '@core/contracts';
import { whereViewable } from './lesson-visibility';

/** A lesson row with its owner, its recording and its newest version's hash, as lists and details show it. */
export interface LessonView {
  id: string;
  schoolId: string;
  ownerId: string | null;
  ownerName: string | null;
  departmentId: string | null;
  title: string;
  tags: string[];
  level: string;
  checkpointCount: number;
  shared: boolean;
  archivedAt: Date | null;
  draftHash: string;
  revision: number;
  savedAt: Date;
  savedById: string | null;
  savedByName: string | null;
  latestVersion: number | null;
  latestHash: string | null;
  createdAt: Date;
  updatedAt: Date;
  recordingId: string;
  recordingTitle: string;
  recordingState: string;
  recordingRenditionKey: string | null;
  recordingDurationSeconds: number | null;
  recordingFrameRate: number | null;
  recordingPosterKey: string | null;
}

export interface LessonDetailView extends LessonView {
  draft: LessonContent;
}

const SUMMARY_COLUMNS = [
  'l.id',
  'l.school_id as schoolId',
  'l.owner_id as ownerId',
  'o.name as ownerName',
  'l.department_id as departmentId',
  'l.title',
  'l.tags',
  'l.level',
  'l.checkpoint_count as checkpointCount',
  'l.shared',
  'l.archived_at as archivedAt',
  'l.draft_hash as draftHash',
  'l.revision',
  'l.saved_at as savedAt',
  'l.saved_by as savedById',
  's.name as savedByName',
  'l.latest_version as latestVersion',
  'v.content_hash as latestHash',
  'l.created_at as createdAt',
  'l.updated_at as updatedAt',
  'r.id as recordingId',
  'r.title as recordingTitle',
  'r.state as recordingState',
  'r.rendition_key as recordingRenditionKey',
  'r.duration_seconds as recordingDurationSeconds',
  'r.frame_rate as recordingFrameRate',
  'r.poster_key as recordingPosterKey',
];

function selectViews(db: Db, schoolId: string) {
  return (
    db('lessons as l')
      // The recording is always the lesson's school's (both joined on school_id: ids alone never cross schools).
      .join('recordings as r', (join) => join.on('r.id', 'l.recording_id').andOn('r.school_id', 'l.school_id'))
      .leftJoin('users as o', 'o.id', 'l.owner_id')
      .leftJoin('users as s', 's.id', 'l.saved_by')
      .leftJoin('lesson_versions as v', (join) => join.on('v.lesson_id', 'l.id').andOn('v.number', 'l.latest_version'))
      .where('l.school_id', schoolId)
  );
}

/** One lesson of one school without its draft (saves and publishes need only its facts). */
export async function findLessonView(db: Db, schoolId: string, lessonId: string): Promise<LessonView | undefined> {
  const [row] = await selectViews(db, schoolId).where('l.id', lessonId).select<LessonView[]>(SUMMARY_COLUMNS).limit(1);
  return row;
}

/** One lesson of one school with its draft: never by id alone. */
export async function findLessonDetail(db: Db, schoolId: string, lessonId: string): Promise<LessonDetailView | undefined> {
  const [row] = await selectViews(db, schoolId)
    .where('l.id', lessonId)
    .select<LessonDetailView[]>([...SUMMARY_COLUMNS, 'l.draft'])
    .limit(1);
  return row;
}

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * The lessons one caller may see, filtered: search on title and tags (case-insensitive, % and _
 * taken literally), one tag, the owner (me, everyone else, or one person) and the state; sorted.
 */
export async function listLessonViews(db: Db, actor: Actor, query: LessonListQuery): Promise<LessonView[]> {
  const rows = selectViews(db, actor.active.schoolId).select<LessonView[]>(SUMMARY_COLUMNS);
  whereViewable(rows, actor);
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    rows.where((w) =>
      w.whereILike('l.title', pattern).orWhereRaw('EXISTS (SELECT 1 FROM unnest(l.tags) AS tag WHERE tag ILIKE ?)', [pattern]),
    );
  }
  // @> can use the GIN index on tags.
  if (query.tag) rows.whereRaw('l.tags @> ARRAY[?]::text[]', [query.tag]);
  if (query.owner === 'me') rows.where('l.owner_id', actor.userId);
  else if (query.owner === 'others') rows.whereRaw('l.owner_id IS DISTINCT FROM ?', [actor.userId]);
  else if (query.owner) rows.where('l.owner_id', query.owner);
  if (query.state === 'archived') rows.whereNotNull('l.archived_at');
  else if (query.state === 'published') rows.whereNull('l.archived_at').whereNotNull('l.latest_version');
  else if (query.state === 'draft') rows.whereNull('l.archived_at').whereNull('l.latest_version');
  if (query.sort === 'title') rows.orderByRaw('lower(l.title) ASC, l.created_at DESC');
  else if (query.sort === 'created') rows.orderBy('l.created_at', 'desc');
  else rows.orderBy('l.updated_at', 'desc');
  return rows.orderBy('l.id');
}

/** Every tag and every owner among the lessons the caller may see (the list's filter choices). */
export async function listFilterChoices(db: Db, actor: Actor): Promise<{ tags: string[]; owners: { id: string; name: string }[] }> {
  const visible = whereViewable(db('lessons as l'), actor);
  const tags = await visible
    .clone()
    .distinct(db.raw('unnest(l.tags) AS tag'))
    .orderBy('tag')
    .then((rows: { tag: string }[]) => rows.map((row) => row.tag));
  const owners = await visible
    .clone()
    .join('users as o', 'o.id', 'l.owner_id')
    .distinct('o.id', 'o.name')
    .orderByRaw('o.name ASC, o.id ASC')
    .then((rows: { id: string; name: string }[]) => rows.map((row) => ({ id: row.id, name: row.name })));
  return { tags, owners };
}
