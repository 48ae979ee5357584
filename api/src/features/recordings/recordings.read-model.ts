import type { Db } from '../../db/knex';
import type { LessonState, RecordingListQuery, RecordingState } from '@core/contracts';
import { lessonStateOf } from '../lessons/lesson-state';

/** A recording row with what the library shows beside it: the owner's name and the open upload. */
export interface RecordingView {
  id: string;
  schoolId: string;
  ownerId: string | null;
  ownerName: string | null;
  title: string;
  originalFileName: string;
  state: RecordingState;
  progress: number;
  failureCode: string | null;
  failureMessage: string | null;
  declaredSize: number;
  storedSize: number | null;
  originalKey: string;
  /** The type sniffed from the bytes by the worker; null before processing. */
  contentType: string | null;
  renditionKey: string | null;
  posterKey: string | null;
  renditionMode: 'transcode' | 'remux' | null;
  durationSeconds: number | null;
  width: number | null;
  height: number | null;
  frameRate: number | null;
  videoCodec: string | null;
  audioCodec: string | null;
  rotation: number | null;
  thumbnails: unknown;
  openUploadId: string | null;
  createdAt: Date;
  updatedAt: Date;
}

function selectViews(db: Db, schoolId: string) {
  return db('recordings as r')
    .leftJoin('users as o', 'o.id', 'r.owner_id')
    .leftJoin('uploads as u', (join) => join.on('u.recording_id', 'r.id').andOnVal('u.status', '=', 'uploading'))
    .where('r.school_id', schoolId)
    .select<RecordingView[]>(
      'r.id',
      'r.school_id as schoolId',
      'r.owner_id as ownerId',
      'o.name as ownerName',
      'r.title',
      'r.original_file_name as originalFileName',
      'r.state',
      'r.progress',
      'r.failure_code as failureCode',
      'r.failure_message as failureMessage',
      'r.declared_size as declaredSize',
      'r.stored_size as storedSize',
      'r.original_key as originalKey',
      'r.content_type as contentType',
      'r.rendition_key as renditionKey',
      'r.poster_key as posterKey',
      'r.rendition_mode as renditionMode',
      'r.duration_seconds as durationSeconds',
      'r.width',
      'r.height',
      'r.frame_rate as frameRate',
      'r.video_codec as videoCodec',
      'r.audio_codec as audioCodec',
      'r.rotation',
      'r.thumbnails',
      'u.id as openUploadId',
      'r.created_at as createdAt',
      'r.updated_at as updatedAt',
    );
}

/** One recording of one school: never by id alone. */
export async function findRecordingView(db: Db, schoolId: string, recordingId: string): Promise<RecordingView | undefined> {
  const [row] = await selectViews(db, schoolId).where('r.id', recordingId).limit(1);
  return row;
}

const escapeLike = (text: string) => text.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * A school's library for one caller: search on title and original file name (case-insensitive),
 * a state filter, mine or the whole school, and the sort. Someone else's unfinished upload is left
 * out here as in `canViewRecording`, which the service still applies to every row.
 */
export async function listRecordingViews(db: Db, schoolId: string, userId: string, query: RecordingListQuery): Promise<RecordingView[]> {
  const rows = selectViews(db, schoolId).where((w) => w.whereNot('r.state', 'uploading').orWhere('r.owner_id', userId));
  if (query.owner === 'mine') rows.where('r.owner_id', userId);
  if (query.state) rows.where('r.state', query.state);
  if (query.q) {
    const pattern = `%${escapeLike(query.q)}%`;
    rows.where((w) => w.whereILike('r.title', pattern).orWhereILike('r.original_file_name', pattern));
  }
  // Title reads A to Z; duration and size put the longest and largest first (what uses the quota).
  switch (query.sort) {
    case 'oldest':
      rows.orderBy([{ column: 'r.created_at', order: 'asc' }]);
      break;
    case 'title':
      rows.orderByRaw('lower(r.title) ASC, r.created_at DESC');
      break;
    case 'duration':
      rows.orderByRaw('r.duration_seconds DESC NULLS LAST, r.created_at DESC');
      break;
    case 'size':
      rows.orderByRaw('coalesce(r.stored_size, r.declared_size) DESC, r.created_at DESC');
      break;
    default:
      rows.orderBy([{ column: 'r.created_at', order: 'desc' }]);
  }
  return rows.orderBy('r.id');
}

/** A lesson built on a recording, as the library names it. */
export interface LessonUse {
  id: string;
  title: string;
  state: LessonState;
}

/**
 * The school's lessons built on each of these recordings (any owner: a recording cannot be deleted
 * while one remains, so the library names them all), by title, keyed by recording id.
 */
export async function listLessonUses(db: Db, schoolId: string, recordingIds: string[]): Promise<Map<string, LessonUse[]>> {
  const uses = new Map<string, LessonUse[]>();
  if (recordingIds.length === 0) return uses;
  const rows = await db('lessons')
    .where('school_id', schoolId)
    .whereIn('recording_id', recordingIds)
    .orderByRaw('lower(title) ASC, id ASC')
    .select<{ id: string; recordingId: string; title: string; archivedAt: Date | null; latestVersion: number | null }[]>(
      'id',
      'recording_id as recordingId',
      'title',
      'archived_at as archivedAt',
      'latest_version as latestVersion',
    );
  for (const row of rows) {
    uses.set(row.recordingId, [...(uses.get(row.recordingId) ?? []), { id: row.id, title: row.title, state: lessonStateOf(row) }]);
  }
  return uses;
}
