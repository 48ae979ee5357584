import { createReadStream } from 'node:fs';
import { mkdir, mkdtemp, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Knex } from 'knex';
import type { Logger } from 'pino';
import { recordingKeys, recordingPrefix } from '@core/recordings';
import type { ObjectStorage } from '../storage/object-storage';
import { MediaFailure } from '../processing/media-failure';
import type { ProcessedMedia, processMedia } from '../processing/process-media';
import { AttemptFailedError, DeadlineAbort, ShutdownAbort } from './attempt-failed';
import { findRecordingForProcessing, markFailed, markReady, startAttempt, type ReadyFacts } from './processing.repository';
import { createProgressWriter } from './progress-writer';
import { TEMP_PREFIX } from './temp-folders';

export type ProcessMedia = typeof processMedia;

export interface ProcessingContext {
  db: Knex;
  storage: ObjectStorage;
  logger: Logger;
  processMedia: ProcessMedia;
  /** `nice` level for ffmpeg (FFMPEG_NICE). */
  nice: number;
  /** True once the worker is shutting down: an error then is the stop's doing, not the file's. */
  isStopping?: () => boolean;
}

export type ProcessingOutcome =
  { outcome: 'ready'; renditionMode: 'transcode' | 'remux' } | { outcome: 'failed'; code: string } | { outcome: 'skipped'; reason: string };

/** The folder every sheet key lives in, from the key scheme itself. */
function thumbnailFolder(prefix: string): string {
  const first = recordingKeys.thumbnailSheet(prefix, 0);
  return first.slice(0, first.lastIndexOf('/') + 1);
}

async function putFile(storage: ObjectStorage, key: string, filePath: string, contentType: string): Promise<void> {
  const { size } = await stat(filePath);
  await storage.put(key, createReadStream(filePath), contentType, size);
}

/** Stores the derived files under their fixed keys (a retry overwrites them) and drops sheets a longer earlier attempt left. */
async function storeDerived(
  storage: ObjectStorage,
  prefix: string,
  media: ProcessedMedia,
): Promise<Pick<ReadyFacts, 'posterKey' | 'renditionKey' | 'thumbnails'>> {
  const posterKey = recordingKeys.poster(prefix);
  const renditionKey = recordingKeys.rendition(prefix);
  await putFile(storage, posterKey, media.poster.path, 'image/jpeg');
  const sheets: { key: string; tiles: number }[] = [];
  for (const [index, sheet] of media.thumbnails.sheets.entries()) {
    const key = recordingKeys.thumbnailSheet(prefix, index);
    await putFile(storage, key, sheet.path, 'image/jpeg');
    sheets.push({ key, tiles: sheet.tiles });
  }
  const current = new Set(sheets.map((sheet) => sheet.key));
  const stale = (await storage.listKeys(thumbnailFolder(prefix))).filter((key) => !current.has(key));
  if (stale.length > 0) await storage.deleteKeys(stale);
  await putFile(storage, renditionKey, media.rendition.path, 'video/mp4');
  const { intervalSeconds, columns, rows, tileWidth, tileHeight } = media.thumbnails;
  return { posterKey, renditionKey, thumbnails: { intervalSeconds, columns, rows, tileWidth, tileHeight, sheets } };
}

function readyFacts(media: ProcessedMedia, stored: Pick<ReadyFacts, 'posterKey' | 'renditionKey' | 'thumbnails'>): ReadyFacts {
  const { probe, rendition } = media;
  return {
    ...stored,
    contentType: media.contentType,
    renditionMode: rendition.mode,
    // What students play: the rendition's length, which checkpoints will be pinned against.
    durationSeconds: rendition.durationSeconds,
    // As the teacher sees it (rotation applied); `rotation` keeps the source's flag.
    width: probe.displayWidth,
    height: probe.displayHeight,
    frameRate: probe.frameRate ?? null,
    videoCodec: probe.videoCodec ?? null,
    audioCodec: probe.hasAudio ? (probe.audioCodec ?? null) : null,
    bitrate: probe.bitrate ?? null,
    rotation: probe.rotation ?? 0,
  };
}

/** Turns whatever stopped an attempt into the error pg-boss records (and retries while attempts remain). */
function retryableError(error: unknown, signal: AbortSignal, stopping: boolean): AttemptFailedError {
  if (signal.aborted && signal.reason instanceof DeadlineAbort) {
    return new AttemptFailedError('timed_out', '', signal.reason.message);
  }
  if (stopping || (signal.aborted && signal.reason instanceof ShutdownAbort)) {
    return new AttemptFailedError('processing_error', '', new ShutdownAbort().message);
  }
  if (error instanceof MediaFailure) return new AttemptFailedError(error.code, error.message, error.message);
  return new AttemptFailedError('processing_error', '', (error as Error)?.message ?? String(error));
}

/**
 * One attempt at processing a recording: original from storage to a temp folder, ffmpeg, derived
 * files back to storage under fixed keys, then one UPDATE to ready. Idempotent: a retry overwrites
 * the same objects and the same row. A file that can never work (MediaFailure, not retryable)
 * ends failed with every object deleted, original included; anything else is thrown for pg-boss to
 * retry, and the dead-letter handler marks the recording failed after the last attempt.
 */
export async function processRecording(ctx: ProcessingContext, recordingId: string, signal: AbortSignal): Promise<ProcessingOutcome> {
  const { db, storage, logger } = ctx;
  const recording = await findRecordingForProcessing(db, recordingId);
  if (!recording) return { outcome: 'skipped', reason: 'the recording was deleted' };
  if (recording.state !== 'processing') return { outcome: 'skipped', reason: `the recording is ${recording.state}` };
  if (!(await startAttempt(db, recordingId))) return { outcome: 'skipped', reason: 'the recording left processing' };

  const prefix = recordingPrefix(recording.schoolId, recording.id);
  const log = logger.child({ recordingId, attempt: recording.processingAttempts + 1 });
  const progress = createProgressWriter(db, recordingId, log);
  const temp = await mkdtemp(path.join(tmpdir(), TEMP_PREFIX));
  try {
    const inputPath = path.join(temp, 'original');
    const workDir = path.join(temp, 'work');
    await mkdir(workDir);
    await storage.download(recording.originalKey, inputPath);
    signal.throwIfAborted();
    const media = await ctx.processMedia({
      inputPath,
      workDir,
      nice: ctx.nice,
      signal,
      // The last few percent are the uploads; ready is 100.
      onProgress: (percent) => progress.report(percent * 0.95),
    });
    signal.throwIfAborted();
    const stored = await storeDerived(storage, prefix, media);
    await progress.flush();
    if (await markReady(db, recordingId, readyFacts(media, stored))) {
      log.info({ renditionMode: media.rendition.mode, durationSeconds: media.rendition.durationSeconds }, 'recording ready');
      return { outcome: 'ready', renditionMode: media.rendition.mode };
    }
    return await discardResult(ctx, recordingId, prefix, log);
  } catch (error) {
    await progress.flush();
    if (!(await findRecordingForProcessing(db, recordingId))) return await discardResult(ctx, recordingId, prefix, log);
    // A stop or a deadline can surface as any ffmpeg error (a stop signals ffmpeg too): never blame the file for it.
    const interrupted = signal.aborted || (ctx.isStopping?.() ?? false);
    if (!interrupted && error instanceof MediaFailure && !error.retryable) {
      // The reason first: a deletion that fails then leaves objects the recording's deletion sweeps,
      // never a row that waits for a retry of bytes that are gone.
      await markFailed(db, recordingId, { code: error.code, message: error.message });
      try {
        const removed = await storage.deletePrefix(prefix);
        log.info({ code: error.code, removedObjects: removed }, 'recording failed: the file cannot be processed');
      } catch (deletion) {
        log.warn({ code: error.code, err: deletion, prefix }, 'recording failed; its objects could not be deleted yet');
      }
      return { outcome: 'failed', code: error.code };
    }
    const failure = retryableError(error, signal, interrupted);
    log.warn({ code: failure.failureCode, err: error }, 'processing attempt failed');
    throw failure;
  } finally {
    await rm(temp, { recursive: true, force: true });
  }
}

/** The row was deleted (or moved on) while ffmpeg ran: objects stored for it must not linger. */
async function discardResult(ctx: ProcessingContext, recordingId: string, prefix: string, log: Logger): Promise<ProcessingOutcome> {
  const now = await findRecordingForProcessing(ctx.db, recordingId);
  if (!now) {
    const removed = await ctx.storage.deletePrefix(prefix);
    log.info({ removedObjects: removed }, 'recording was deleted during processing: its objects are removed');
    return { outcome: 'skipped', reason: 'the recording was deleted during processing' };
  }
  log.warn({ state: now.state }, 'recording left processing while it was being processed: result discarded');
  return { outcome: 'skipped', reason: `the recording became ${now.state} during processing` };
}
