import { Router } from 'express';
import { DepartmentCreateSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody } from '../../middleware/validate';
import type { DepartmentsService } from './departments.service';

/** Mounted at /api. */
export function departmentsRoutes(departments: DepartmentsService): Router {
  const router = Router();

  router.get('/departments/overview', requireRole('coordinator', 'substitute'), async (req, res) => {
    res.json({ departments: await departments.overview(req.actor!) });
  });

  router.get('/admin/departments', requireRole('admin'), async (req, res) => {
    res.json({ departments: await departments.list(req.actor!) });
  });

  router.post('/admin/departments', requireRole('admin'), validateBody(DepartmentCreateSchema), async (req, res) => {
    res.status(201).json(await departments.create(req.actor!, bodyOf(req, DepartmentCreateSchema)));
  });

  return router;
}
