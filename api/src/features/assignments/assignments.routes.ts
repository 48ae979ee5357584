import { Router, type Response } from 'express';
import { z } from 'zod';
import { AssignmentCreateSchema, AssignmentListQuerySchema, AssignmentMoveSchema, AssignmentUpdateSchema, IdSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams, validateQuery } from '../../middleware/validate';
import type { AssignmentsService } from './assignments.service';

const AssignmentParams = z.object({ assignmentId: IdSchema });

/**
 * Mounted at /api: assignments as staff see them. The role checks say who may try; the
 * assignments policy decides on the stored row (view, manage).
 */
export function assignmentsRoutes(assignments: AssignmentsService): Router {
  const router = Router();
  // Substitutes may ask and get none yet (cover plans will give them theirs).
  const readers = () => requireRole('teacher', 'coordinator', 'substitute', 'admin');
  // Assigning and changing: teachers (their own classes and assignments) and admins (any in the school).
  const managers = () => requireRole('teacher', 'admin');
  const id = (res: Response): string => res.locals.params.assignmentId;

  router.post('/assignments', managers(), validateBody(AssignmentCreateSchema), async (req, res) => {
    res.status(201).json(await assignments.create(req.actor!, bodyOf(req, AssignmentCreateSchema)));
  });

  router.get('/assignments', readers(), validateQuery(AssignmentListQuerySchema), async (req, res) => {
    res.json(await assignments.list(req.actor!, res.locals.query));
  });

  router.get('/assignments/:assignmentId', readers(), validateParams(AssignmentParams), async (req, res) => {
    res.json(await assignments.detail(req.actor!, id(res)));
  });

  router.put(
    '/assignments/:assignmentId',
    managers(),
    validateParams(AssignmentParams),
    validateBody(AssignmentUpdateSchema),
    async (req, res) => {
      res.json(await assignments.update(req.actor!, id(res), bodyOf(req, AssignmentUpdateSchema)));
    },
  );

  router.post(
    '/assignments/:assignmentId/move',
    managers(),
    validateParams(AssignmentParams),
    validateBody(AssignmentMoveSchema),
    async (req, res) => {
      res.json(await assignments.move(req.actor!, id(res), bodyOf(req, AssignmentMoveSchema)));
    },
  );

  router.delete('/assignments/:assignmentId', managers(), validateParams(AssignmentParams), async (req, res) => {
    await assignments.remove(req.actor!, id(res));
    res.status(204).end();
  });

  return router;
}
