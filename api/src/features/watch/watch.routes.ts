import { Router, type Response } from 'express';
import { z } from 'zod';
import { IdSchema, ViewingBeaconSchema, ViewingReportSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams } from '../../middleware/validate';
import { sameOriginOnly, VIEWING_BEACON_ROUTE } from './viewing-beacon';
import type { WatchService } from './watch.service';

const AssignmentParams = z.object({ assignmentId: IdSchema });
const CaptionParams = z.object({ assignmentId: IdSchema, captionId: IdSchema });

const students = () => requireRole('student');
const assignmentId = (res: Response): string => res.locals.params.assignmentId;

/** Answers about one student's own progress and answers: never from a shared or stale cache. */
const noStore = (res: Response) => res.set('Cache-Control', 'private, no-store');

function sendVtt(res: Response, text: string): void {
  res.set({ 'Content-Type': 'text/vtt; charset=utf-8', 'X-Content-Type-Options': 'nosniff', 'Cache-Control': 'private, no-store' });
  res.send(text);
}

/** Mounted at /api: a student's assignments, the watch page, safety, viewing and results. */
export function watchRoutes(watch: WatchService, options: { publicUrl: string }): Router {
  const router = Router();

  router.get('/student/assignments', students(), async (req, res) => {
    noStore(res).json(await watch.home(req.actor!));
  });

  router.get('/student/assignments/:assignmentId/watch', students(), validateParams(AssignmentParams), async (req, res) => {
    noStore(res).json(await watch.view(req.actor!, assignmentId(res)));
  });

  router.post('/student/assignments/:assignmentId/safety', students(), validateParams(AssignmentParams), async (req, res) => {
    await watch.acknowledgeSafety(req.actor!, assignmentId(res));
    res.status(204).end();
  });

  router.post(
    '/student/assignments/:assignmentId/viewing',
    students(),
    validateParams(AssignmentParams),
    validateBody(ViewingReportSchema),
    async (req, res) => {
      noStore(res).json(await watch.recordViewing(req.actor!, assignmentId(res), bodyOf(req, ViewingReportSchema)));
    },
  );

  // The CSRF token was read from this body (see viewing-beacon.ts); nobody reads a beacon's reply.
  router.post(
    VIEWING_BEACON_ROUTE,
    students(),
    sameOriginOnly(options.publicUrl),
    validateParams(AssignmentParams),
    validateBody(ViewingBeaconSchema),
    async (req, res) => {
      const { intervals, positionMs } = bodyOf(req, ViewingBeaconSchema);
      await watch.recordViewing(req.actor!, assignmentId(res), { intervals, positionMs });
      res.status(204).end();
    },
  );

  router.get('/student/assignments/:assignmentId/results', students(), validateParams(AssignmentParams), async (req, res) => {
    noStore(res).json(await watch.results(req.actor!, assignmentId(res)));
  });

  router.get('/student/assignments/:assignmentId/thumbnails.vtt', students(), validateParams(AssignmentParams), async (req, res) => {
    sendVtt(res, await watch.thumbnailsVtt(req.actor!, assignmentId(res)));
  });

  router.get('/student/assignments/:assignmentId/captions/:captionId.vtt', students(), validateParams(CaptionParams), async (req, res) => {
    const { captionId } = res.locals.params;
    sendVtt(res, await watch.captionFile(req.actor!, assignmentId(res), captionId));
  });

  return router;
}
