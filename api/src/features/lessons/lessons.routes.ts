import { Router, type Response } from 'express';
import { z } from 'zod';
import { DraftSaveSchema, IdSchema, LessonCreateSchema, LessonListQuerySchema, LessonUpdateSchema, PublishSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams, validateQuery } from '../../middleware/validate';
import type { LessonsService } from './lessons.service';
import type { LessonDraftsService } from './lesson-drafts.service';
import type { LessonMediaService } from './lesson-media.service';
import { editConflictHandler } from './lesson-errors';

const LessonParams = z.object({ lessonId: IdSchema });
const VersionParams = z.object({
  lessonId: IdSchema,
  number: z.coerce
    .number({ error: 'Expected a version number.' })
    .int({ error: 'A version number is a whole number.' })
    .min(1, { error: 'Versions are numbered from 1.' }),
});
const CaptionParams = z.object({ lessonId: IdSchema, captionId: IdSchema });

/** Tracks are text the browser must read as WebVTT and nothing else. */
function sendVtt(res: Response, text: string, cacheControl: string): void {
  res.set({ 'Content-Type': 'text/vtt; charset=utf-8', 'X-Content-Type-Options': 'nosniff', 'Cache-Control': cacheControl });
  res.send(text);
}

/**
 * Mounted at /api: the lessons library, drafts, versions and the lesson's recording. The role
 * checks say who may try; the lessons policy decides on the stored row (view, edit, duplicate).
 */
export function lessonsRoutes(services: { lessons: LessonsService; drafts: LessonDraftsService; media: LessonMediaService }): Router {
  const { lessons, drafts, media } = services;
  const router = Router();
  // Everyone who may open some lesson: owners, colleagues and coordinators of the department, substitutes, admins.
  const viewers = () => requireRole('teacher', 'coordinator', 'substitute', 'admin');
  // Changing a lesson: its owner (a teacher, or a substitute's own copy) or an admin; the policy decides on the row.
  const editors = () => requireRole('teacher', 'substitute', 'admin');
  const id = (res: Response): string => res.locals.params.lessonId;

  router.get('/lessons', viewers(), validateQuery(LessonListQuerySchema), async (req, res) => {
    res.json(await lessons.list(req.actor!, res.locals.query));
  });

  router.post('/lessons', requireRole('teacher'), validateBody(LessonCreateSchema), async (req, res) => {
    res.status(201).json(await lessons.create(req.actor!, bodyOf(req, LessonCreateSchema)));
  });

  router.get('/lessons/:lessonId', viewers(), validateParams(LessonParams), async (req, res) => {
    res.json(await lessons.detail(req.actor!, id(res)));
  });

  router.put('/lessons/:lessonId/draft', editors(), validateParams(LessonParams), validateBody(DraftSaveSchema), async (req, res) => {
    res.json(await drafts.save(req.actor!, id(res), bodyOf(req, DraftSaveSchema)));
  });

  router.patch('/lessons/:lessonId', editors(), validateParams(LessonParams), validateBody(LessonUpdateSchema), async (req, res) => {
    res.json(await lessons.update(req.actor!, id(res), bodyOf(req, LessonUpdateSchema)));
  });

  router.delete('/lessons/:lessonId', editors(), validateParams(LessonParams), async (req, res) => {
    await lessons.remove(req.actor!, id(res));
    res.status(204).end();
  });

  router.post('/lessons/:lessonId/publish', editors(), validateParams(LessonParams), validateBody(PublishSchema), async (req, res) => {
    res.status(201).json(await drafts.publish(req.actor!, id(res), bodyOf(req, PublishSchema)));
  });

  router.get('/lessons/:lessonId/versions', viewers(), validateParams(LessonParams), async (req, res) => {
    res.json(await drafts.versions(req.actor!, id(res)));
  });

  router.get('/lessons/:lessonId/versions/:number', viewers(), validateParams(VersionParams), async (req, res) => {
    res.json(await drafts.version(req.actor!, id(res), res.locals.params.number));
  });

  router.post('/lessons/:lessonId/duplicate', requireRole('teacher', 'substitute'), validateParams(LessonParams), async (req, res) => {
    res.status(201).json(await lessons.duplicate(req.actor!, id(res)));
  });

  router.get('/lessons/:lessonId/playback', viewers(), validateParams(LessonParams), async (req, res) => {
    // Signed URLs inside: never from a shared cache, fetched afresh when they expire.
    res.set('Cache-Control', 'private, no-store').json(await media.playback(req.actor!, id(res)));
  });

  router.get('/lessons/:lessonId/thumbnails.vtt', viewers(), validateParams(LessonParams), async (req, res) => {
    sendVtt(res, await media.thumbnailsVtt(req.actor!, id(res)), 'private, no-store');
  });

  router.get('/lessons/:lessonId/captions/:captionId.vtt', viewers(), validateParams(CaptionParams), async (req, res) => {
    const { lessonId, captionId } = res.locals.params;
    // A track's text never changes under its id, so an hour in the caller's cache is safe (as for recordings).
    sendVtt(res, await media.captionFile(req.actor!, lessonId, captionId), 'private, max-age=3600');
  });

  // Only errors of the routes above pass through here (a router is not entered for others' errors).
  router.use(editConflictHandler);
  return router;
}
