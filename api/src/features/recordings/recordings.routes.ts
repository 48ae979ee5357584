import { Router, type Response } from 'express';
import { z } from 'zod';
import { CaptionCreateSchema, CaptionUpdateSchema, IdSchema, RecordingListQuerySchema, RecordingUpdateSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams, validateQuery } from '../../middleware/validate';
import type { RecordingsService } from './recordings.service';
import type { RecordingMediaService } from './recording-media.service';
import type { CaptionsService } from './captions.service';

const RecordingParams = z.object({ recordingId: IdSchema });
const CaptionParams = z.object({ recordingId: IdSchema, captionId: IdSchema });

/** Tracks are text the browser must read as WebVTT and nothing else. */
function sendVtt(res: Response, text: string, cacheControl: string): void {
  res.set({ 'Content-Type': 'text/vtt; charset=utf-8', 'X-Content-Type-Options': 'nosniff', 'Cache-Control': cacheControl });
  res.send(text);
}

/** Mounted at /api: the recordings library, playback, download and caption tracks. */
export function recordingsRoutes(services: {
  recordings: RecordingsService;
  media: RecordingMediaService;
  captions: CaptionsService;
}): Router {
  const { recordings, media, captions } = services;
  const router = Router();
  const teacher = () => requireRole('teacher');
  // An admin of the school may also rename and delete (the policy decides on the row).
  const teacherOrAdmin = () => requireRole('teacher', 'admin');

  router.get('/recordings', teacher(), validateQuery(RecordingListQuerySchema), async (req, res) => {
    res.json({ recordings: await recordings.list(req.actor!, res.locals.query) });
  });

  router.get('/recordings/:recordingId', teacher(), validateParams(RecordingParams), async (req, res) => {
    res.json(await recordings.detail(req.actor!, res.locals.params.recordingId));
  });

  router.patch(
    '/recordings/:recordingId',
    teacherOrAdmin(),
    validateParams(RecordingParams),
    validateBody(RecordingUpdateSchema),
    async (req, res) => {
      res.json(await recordings.rename(req.actor!, res.locals.params.recordingId, bodyOf(req, RecordingUpdateSchema).title));
    },
  );

  router.delete('/recordings/:recordingId', teacherOrAdmin(), validateParams(RecordingParams), async (req, res) => {
    await recordings.remove(req.actor!, res.locals.params.recordingId);
    res.status(204).end();
  });

  router.post('/recordings/:recordingId/retry', teacher(), validateParams(RecordingParams), async (req, res) => {
    res.json(await recordings.retry(req.actor!, res.locals.params.recordingId));
  });

  router.get('/recordings/:recordingId/playback', teacher(), validateParams(RecordingParams), async (req, res) => {
    const playback = await media.playback(req.actor!, res.locals.params.recordingId);
    // The answer carries signed URLs: never from a shared cache, and fetched afresh when they expire.
    res.set('Cache-Control', 'private, no-store').json(playback);
  });

  router.get('/recordings/:recordingId/download', teacher(), validateParams(RecordingParams), async (req, res) => {
    const url = await media.downloadUrl(req.actor!, res.locals.params.recordingId);
    res.set('Cache-Control', 'private, no-store').redirect(302, url);
  });

  router.get('/recordings/:recordingId/thumbnails.vtt', teacher(), validateParams(RecordingParams), async (req, res) => {
    // The sheet URLs inside expire, so no copy may be kept.
    sendVtt(res, await media.thumbnailsVtt(req.actor!, res.locals.params.recordingId), 'private, no-store');
  });

  router.post(
    '/recordings/:recordingId/captions',
    teacher(),
    validateParams(RecordingParams),
    validateBody(CaptionCreateSchema),
    async (req, res) => {
      res.status(201).json(await captions.create(req.actor!, res.locals.params.recordingId, bodyOf(req, CaptionCreateSchema)));
    },
  );

  router.get('/recordings/:recordingId/captions/:captionId.vtt', teacher(), validateParams(CaptionParams), async (req, res) => {
    const { recordingId, captionId } = res.locals.params;
    // A track's text never changes under its id (a new file is a new track), so an hour in the caller's cache is safe.
    sendVtt(res, await captions.file(req.actor!, recordingId, captionId), 'private, max-age=3600');
  });

  router.patch(
    '/recordings/:recordingId/captions/:captionId',
    teacher(),
    validateParams(CaptionParams),
    validateBody(CaptionUpdateSchema),
    async (req, res) => {
      const { recordingId, captionId } = res.locals.params;
      res.json(await captions.update(req.actor!, recordingId, captionId, bodyOf(req, CaptionUpdateSchema)));
    },
  );

  router.delete('/recordings/:recordingId/captions/:captionId', teacher(), validateParams(CaptionParams), async (req, res) => {
    const { recordingId, captionId } = res.locals.params;
    await captions.remove(req.actor!, recordingId, captionId);
    res.status(204).end();
  });

  return router;
}
