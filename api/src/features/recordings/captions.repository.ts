import type { Db } from '../../db/knex';

export interface CaptionRow {
  id: string;
  recordingId: string;
  language: string;
  label: string;
  isDefault: boolean;
  cueCount: number;
  createdAt: Date;
  updatedAt: Date;
}

const CAPTION_COLUMNS = [
  'id',
  'recording_id as recordingId',
  'language',
  'label',
  'is_default as isDefault',
  'cue_count as cueCount',
  'created_at as createdAt',
  'updated_at as updatedAt',
];

/** A recording's caption tracks, the default first, then by language. */
export async function listCaptions(db: Db, recordingId: string): Promise<CaptionRow[]> {
  return db('recording_captions')
    .where({ recording_id: recordingId })
    .orderBy([
      { column: 'is_default', order: 'desc' },
      { column: 'language', order: 'asc' },
    ])
    .select(CAPTION_COLUMNS);
}

/** Callers pass a recording already loaded for the caller's school: a caption is found only through it. */
export async function findCaption(db: Db, recordingId: string, captionId: string): Promise<CaptionRow | undefined> {
  return db('recording_captions').where({ id: captionId, recording_id: recordingId }).first(CAPTION_COLUMNS);
}

export async function findCaptionText(db: Db, recordingId: string, captionId: string): Promise<string | undefined> {
  const row = await db('recording_captions').where({ id: captionId, recording_id: recordingId }).first('vtt');
  return row?.vtt;
}

export async function findCaptionByLanguage(db: Db, recordingId: string, language: string): Promise<CaptionRow | undefined> {
  return db('recording_captions').where({ recording_id: recordingId, language }).first(CAPTION_COLUMNS);
}

export async function countCaptions(db: Db, recordingId: string): Promise<number> {
  const row = await db('recording_captions').where({ recording_id: recordingId }).count<{ count: string }>('* as count').first();
  return Number(row?.count ?? 0);
}

/** Clears the default flag first: a partial unique index allows one default per recording. */
export async function clearDefault(db: Db, recordingId: string): Promise<void> {
  await db('recording_captions')
    .where({ recording_id: recordingId, is_default: true })
    .update({ is_default: false, updated_at: db.fn.now() });
}

export async function insertCaption(
  db: Db,
  row: { recordingId: string; language: string; label: string; isDefault: boolean; vtt: string; cueCount: number },
): Promise<CaptionRow> {
  const [created] = await db('recording_captions')
    .insert({
      recording_id: row.recordingId,
      language: row.language,
      label: row.label,
      is_default: row.isDefault,
      vtt: row.vtt,
      cue_count: row.cueCount,
    })
    .returning(CAPTION_COLUMNS);
  return created as CaptionRow;
}

export async function updateCaption(db: Db, captionId: string, changes: { label?: string; isDefault?: boolean }): Promise<void> {
  await db('recording_captions')
    .where({ id: captionId })
    .update({
      ...(changes.label !== undefined ? { label: changes.label } : {}),
      ...(changes.isDefault !== undefined ? { is_default: changes.isDefault } : {}),
      updated_at: db.fn.now(),
    });
}

export async function deleteCaption(db: Db, captionId: string): Promise<void> {
  await db('recording_captions').where({ id: captionId }).delete();
}

/** After the default is deleted, the oldest remaining track takes its place. */
export async function promoteOldestCaption(db: Db, recordingId: string): Promise<void> {
  const oldest = await db('recording_captions')
    .where({ recording_id: recordingId })
    .orderBy([
      { column: 'created_at', order: 'asc' },
      { column: 'id', order: 'asc' },
    ])
    .first('id');
  if (oldest) await updateCaption(db, oldest.id, { isDefault: true });
}
