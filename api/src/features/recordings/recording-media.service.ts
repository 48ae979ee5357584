import type { Knex } from 'knex';
import type { PlaybackDto } from '@core/contracts';
import type { Actor } from '../../auth/actor';
import type { ObjectStorage } from '../../storage/object-storage';
import { ConflictError, NotFoundError } from '../../errors';
import { listCaptions } from './captions.repository';
import { loadViewable } from './recording-access';
import { findRecordingView, type RecordingView } from './recordings.read-model';
import { presentCaption, thumbnailsPath } from './recordings.presenter';
import { buildThumbnailsVtt, parseThumbnailGrid } from './thumbnails-vtt';
import type { MediaUrls } from './media-urls';

interface Deps {
  db: Knex;
  storage: ObjectStorage;
  urls: MediaUrls;
}

/** Why there is nothing to play yet, in words the teacher can act on. */
function notReadySentence(row: RecordingView): string {
  switch (row.state) {
    case 'uploading':
      return 'This recording is still uploading, so it cannot be played yet.';
    case 'processing':
      return `This recording is still being prepared for playback (${row.progress}% done). It plays once it is ready.`;
    case 'failed':
      return `This recording could not be prepared for playback, so there is nothing to play. ${row.failureMessage ?? ''}`.trim();
    default:
      return 'The playable version of this recording is missing: delete it and upload the file again.';
  }
}

function requireReady(row: RecordingView): RecordingView & { renditionKey: string } {
  if (row.state !== 'ready' || row.renditionKey === null) throw new ConflictError('not_ready', notReadySentence(row));
  return row as RecordingView & { renditionKey: string };
}

/** Playing, downloading and the thumbnails track: every URL is signed afresh for this request. */
export function createRecordingMediaService({ db, storage, urls }: Deps) {
  /** The duration the tracks end at: the probed one, or what the tiles cover if probing left none. */
  function durationOf(row: RecordingView): number {
    const grid = parseThumbnailGrid(row.thumbnails);
    const tiles = grid?.sheets.reduce((sum, sheet) => sum + sheet.tiles, 0) ?? 0;
    return row.durationSeconds ?? tiles * (grid?.intervalSeconds ?? 0);
  }

  async function playbackOf(found: RecordingView): Promise<PlaybackDto> {
    const row = requireReady(found);
    const duration = durationOf(row);
    const src = await urls.playback(row.renditionKey, duration);
    const poster = row.posterKey ? await urls.playback(row.posterKey, duration) : null;
    const captions = await listCaptions(db, row.id);
    return {
      recordingId: row.id,
      src: { url: src.url, type: 'video/mp4' },
      posterUrl: poster?.url ?? null,
      expiresAt: src.expiresAt,
      durationSeconds: duration,
      width: row.width ?? 0,
      height: row.height ?? 0,
      thumbnailsUrl: parseThumbnailGrid(row.thumbnails) ? thumbnailsPath(row.id) : null,
      captions: captions.map(presentCaption),
    };
  }

  async function thumbnailsVttOf(found: RecordingView): Promise<string> {
    const row = requireReady(found);
    const grid = parseThumbnailGrid(row.thumbnails);
    if (!grid) throw new NotFoundError('The thumbnail track of this recording');
    const duration = durationOf(row);
    const sheetUrls = await Promise.all(grid.sheets.map(async (sheet) => (await urls.playback(sheet.key, duration)).url));
    return buildThumbnailsVtt(grid, duration, sheetUrls);
  }

  /** A recording the caller's route has already authorised through something else (a lesson they may view). */
  async function authorised(schoolId: string, recordingId: string): Promise<RecordingView> {
    const row = await findRecordingView(db, schoolId, recordingId);
    if (!row) throw new NotFoundError('The recording of this lesson');
    return row;
  }

  return {
    async playback(actor: Actor, recordingId: string): Promise<PlaybackDto> {
      return playbackOf(await loadViewable(db, actor, recordingId));
    },

    /**
     * Playback of a recording the caller reaches through a lesson: the lessons policy decided, so the
     * recordings policy (teachers and admins only) is not applied again. Always within one school.
     */
    async playbackAuthorised(schoolId: string, recordingId: string): Promise<PlaybackDto> {
      return playbackOf(await authorised(schoolId, recordingId));
    },

    /** A presigned URL of the original under its own file name, for a 302. */
    async downloadUrl(actor: Actor, recordingId: string): Promise<string> {
      const row = await loadViewable(db, actor, recordingId);
      if (row.state === 'uploading') {
        throw new ConflictError('not_ready', 'This recording is still uploading: its file can be downloaded once the upload completes.');
      }
      // Uploads refused after completion (too large, size mismatch, over quota) had their object deleted.
      if (!(await storage.head(row.originalKey))) throw new NotFoundError('The original file of this recording');
      return (await urls.download(row.originalKey, row.originalFileName, row.durationSeconds, row.contentType)).url;
    },

    /** The WebVTT thumbnails track, with sheet URLs signed to last as long as a playback URL. */
    async thumbnailsVtt(actor: Actor, recordingId: string): Promise<string> {
      return thumbnailsVttOf(await loadViewable(db, actor, recordingId));
    },

    /** The thumbnails track of a recording reached through a lesson (see playbackAuthorised). */
    async thumbnailsVttAuthorised(schoolId: string, recordingId: string): Promise<string> {
      return thumbnailsVttOf(await authorised(schoolId, recordingId));
    },
  };
}

export type RecordingMediaService = ReturnType<typeof createRecordingMediaService>;
