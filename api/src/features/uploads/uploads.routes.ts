import { Router } from 'express';
import { z } from 'zod';
import { IdSchema, PartParamsSchema, UploadCompleteSchema, UploadCreateSchema, UploadResumeSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams } from '../../middleware/validate';
import type { UploadsService } from './uploads.service';

const UploadParams = z.object({ uploadId: IdSchema });

/** Mounted at /api: a teacher's direct uploads to storage (the bytes never pass through the API). */
export function uploadsRoutes(uploads: UploadsService): Router {
  const router = Router();

  router.get('/uploads', requireRole('teacher'), async (req, res) => {
    res.json(await uploads.listOpen(req.actor!));
  });

  router.post('/uploads', requireRole('teacher'), validateBody(UploadCreateSchema), async (req, res) => {
    res.status(201).json(await uploads.create(req.actor!, bodyOf(req, UploadCreateSchema)));
  });

  router.post(
    '/uploads/:uploadId/resume',
    requireRole('teacher'),
    validateParams(UploadParams),
    validateBody(UploadResumeSchema),
    async (req, res) => {
      res.json(await uploads.resume(req.actor!, res.locals.params.uploadId, bodyOf(req, UploadResumeSchema)));
    },
  );

  router.get('/uploads/:uploadId/parts', requireRole('teacher'), validateParams(UploadParams), async (req, res) => {
    res.json(await uploads.listParts(req.actor!, res.locals.params.uploadId));
  });

  router.post('/uploads/:uploadId/parts/:partNumber', requireRole('teacher'), validateParams(PartParamsSchema), async (req, res) => {
    const { uploadId, partNumber } = res.locals.params as z.infer<typeof PartParamsSchema>;
    res.json(await uploads.signPart(req.actor!, uploadId, partNumber));
  });

  router.post(
    '/uploads/:uploadId/complete',
    requireRole('teacher'),
    validateParams(UploadParams),
    validateBody(UploadCompleteSchema),
    async (req, res) => {
      res.json(await uploads.complete(req.actor!, res.locals.params.uploadId, bodyOf(req, UploadCompleteSchema)));
    },
  );

  router.delete('/uploads/:uploadId', requireRole('teacher'), validateParams(UploadParams), async (req, res) => {
    await uploads.abort(req.actor!, res.locals.params.uploadId);
    res.status(204).end();
  });

  return router;
}
