import { Router, type Request, type Response } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { IdSchema } from '@core/contracts';
import { chaptersVtt, checkpointsVtt } from '@core/lessons/lesson-vtt';
import { validateParams, validateQuery } from '../../middleware/validate';
import { lessonViewers } from './lesson-preview.routes';
import { loadLessonContent, VersionQuerySchema, type VersionQuery } from './lesson-transfer.read-model';

const LessonParams = z.object({ lessonId: IdSchema });

/** Text the browser must read as WebVTT and nothing else; a draft's track changes with each save. */
function sendVtt(res: Response, text: string): void {
  res.set({ 'Content-Type': 'text/vtt; charset=utf-8', 'X-Content-Type-Options': 'nosniff', 'Cache-Control': 'private, no-cache' });
  res.send(text);
}

/**
 * Mounted at /api: the chapters (kind "chapters") and checkpoint pins (kind "metadata") of the
 * draft for editors, of the newest version for others, or of `?version=N`.
 */
export function lessonVttRoutes({ db }: { db: Knex }): Router {
  const router = Router();
  const track = (build: typeof chaptersVtt) => [
    lessonViewers(),
    validateParams(LessonParams),
    validateQuery(VersionQuerySchema),
    async (req: Request, res: Response) => {
      const { version } = res.locals.query as VersionQuery;
      const view = await loadLessonContent(db, req.actor!, res.locals.params.lessonId, { version });
      sendVtt(res, build(view.content));
    },
  ];

  router.get('/lessons/:lessonId/chapters.vtt', ...track(chaptersVtt));
  router.get('/lessons/:lessonId/checkpoints.vtt', ...track(checkpointsVtt));
  return router;
}
