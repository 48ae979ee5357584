import { Router } from 'express';
import { z } from 'zod';
import { IdSchema, ResponseSubmitSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams } from '../../middleware/validate';
import type { ResponsesService } from './responses.service';

const AssignmentParams = z.object({ assignmentId: IdSchema });

/** Mounted at /api: a student's answers (graded on the server, recorded exactly once). */
export function responsesRoutes(responses: ResponsesService): Router {
  const router = Router();

  router.post(
    '/student/assignments/:assignmentId/responses',
    requireRole('student'),
    validateParams(AssignmentParams),
    validateBody(ResponseSubmitSchema),
    async (req, res) => {
      const { status, result } = await responses.submit(req.actor!, res.locals.params.assignmentId, bodyOf(req, ResponseSubmitSchema));
      res.status(status).set('Cache-Control', 'private, no-store').json(result);
    },
  );

  return router;
}
