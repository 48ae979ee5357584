import { Router } from 'express';
import { z } from 'zod';
import { IdSchema, InvitationCreateSchema, PeopleQuerySchema, PersonUpdateSchema, RosterUploadSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams, validateQuery } from '../../middleware/validate';
import type { PeopleService } from './people.service';

const PersonParams = z.object({ userId: IdSchema });

/** Mounted at /api/admin. */
export function peopleRoutes(people: PeopleService): Router {
  const router = Router();

  router.get('/people', requireRole('admin'), validateQuery(PeopleQuerySchema), async (req, res) => {
    res.json(await people.list(req.actor!, res.locals.query));
  });

  router.patch(
    '/people/:userId',
    requireRole('admin'),
    validateParams(PersonParams),
    validateBody(PersonUpdateSchema),
    async (req, res) => {
      res.json(await people.update(req.actor!, res.locals.params.userId, bodyOf(req, PersonUpdateSchema), req.ip ?? 'unknown'));
    },
  );

  router.post('/invitations', requireRole('admin'), validateBody(InvitationCreateSchema), async (req, res) => {
    res.status(201).json(await people.invite(req.actor!, bodyOf(req, InvitationCreateSchema), req.ip ?? 'unknown'));
  });

  router.post('/roster/preview', requireRole('admin'), validateBody(RosterUploadSchema), async (req, res) => {
    res.json(await people.preview(req.actor!, bodyOf(req, RosterUploadSchema).csv));
  });

  router.post('/roster/import', requireRole('admin'), validateBody(RosterUploadSchema), async (req, res) => {
    res.status(201).json(await people.importRoster(req.actor!, bodyOf(req, RosterUploadSchema).csv, req.ip ?? 'unknown'));
  });

  return router;
}
