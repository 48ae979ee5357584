import { Router } from 'express';
import { z } from 'zod';
import { CheckpointKeySchema, IdSchema, PreviewAnswerSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams } from '../../middleware/validate';
import type { LessonPreviewService } from './lesson-preview.service';

const LessonParams = z.object({ lessonId: IdSchema });
const CheckpointParams = z.object({ lessonId: IdSchema, key: CheckpointKeySchema });

/** Everyone who may open a lesson (the policy then decides on the row). */
export const lessonViewers = () => requireRole('teacher', 'coordinator', 'substitute', 'admin');

/** Mounted at /api: the draft in the student player, graded on the server, nothing recorded. */
export function lessonPreviewRoutes(preview: LessonPreviewService): Router {
  const router = Router();

  router.get('/lessons/:lessonId/preview', lessonViewers(), validateParams(LessonParams), async (req, res) => {
    // A draft changes with every save: never from a cache.
    res.set('Cache-Control', 'private, no-store').json(await preview.view(req.actor!, res.locals.params.lessonId));
  });

  router.post(
    '/lessons/:lessonId/preview/checkpoints/:key/answer',
    lessonViewers(),
    validateParams(CheckpointParams),
    validateBody(PreviewAnswerSchema),
    async (req, res) => {
      const { lessonId, key } = res.locals.params;
      res.set('Cache-Control', 'private, no-store').json(await preview.answer(req.actor!, lessonId, key, bodyOf(req, PreviewAnswerSchema)));
    },
  );

  return router;
}
