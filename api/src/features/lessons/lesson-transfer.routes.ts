import { Router } from 'express';
import { create as contentDisposition } from 'content-disposition';
import { z } from 'zod';
import { IdSchema, LessonImportSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams, validateQuery } from '../../middleware/validate';
import { lessonViewers } from './lesson-preview.routes';
import { VersionQuerySchema, type VersionQuery } from './lesson-transfer.read-model';
import type { LessonTransferService } from './lesson-transfer.service';

const LessonParams = z.object({ lessonId: IdSchema });

/** Mounted at /api: a lesson as a file to keep or move, and a file back into a new draft. */
export function lessonTransferRoutes(transfer: LessonTransferService): Router {
  const router = Router();

  router.get(
    '/lessons/:lessonId/export',
    lessonViewers(),
    validateParams(LessonParams),
    validateQuery(VersionQuerySchema),
    async (req, res) => {
      const { version } = res.locals.query as VersionQuery;
      const file = await transfer.exportFile(req.actor!, res.locals.params.lessonId, version);
      res.set({
        'Content-Type': 'application/json; charset=utf-8',
        // RFC 6266 with an RFC 5987 filename* for titles outside ASCII.
        'Content-Disposition': contentDisposition(file.fileName),
        'X-Content-Type-Options': 'nosniff',
        'Cache-Control': 'private, no-store',
      });
      res.send(file.text);
    },
  );

  router.post('/lessons/import', requireRole('teacher'), validateBody(LessonImportSchema), async (req, res) => {
    res.status(201).json(await transfer.importFile(req.actor!, bodyOf(req, LessonImportSchema)));
  });

  return router;
}
