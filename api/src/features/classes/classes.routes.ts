import { Router } from 'express';
import { z } from 'zod';
import { ClassCreateSchema, EnrolSchema, IdSchema, StudentJoinSchema } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody, validateParams } from '../../middleware/validate';
import type { ClassesService } from './classes.service';

const ClassParams = z.object({ classId: IdSchema });
const EnrolmentParams = z.object({ classId: IdSchema, userId: IdSchema });

/** Mounted at /api: teacher, student, shared and admin class routes. */
export function classesRoutes(classes: ClassesService): Router {
  const router = Router();

  router.get('/teacher/classes', requireRole('teacher'), async (req, res) => {
    res.json({ classes: await classes.listForTeacher(req.actor!) });
  });

  router.get('/student/classes', requireRole('student'), async (req, res) => {
    res.json({ classes: await classes.listForStudent(req.actor!) });
  });

  router.post('/student/enrolments', requireRole('student'), validateBody(StudentJoinSchema), async (req, res) => {
    res.status(201).json(await classes.joinByCode(req.actor!, bodyOf(req, StudentJoinSchema).code));
  });

  router.get('/classes/:classId', requireRole('teacher', 'coordinator', 'admin'), validateParams(ClassParams), async (req, res) => {
    res.json(await classes.getDetail(req.actor!, res.locals.params.classId));
  });

  router.get('/admin/classes', requireRole('admin'), async (req, res) => {
    res.json({ classes: await classes.listForSchool(req.actor!) });
  });

  router.post('/admin/classes', requireRole('admin'), validateBody(ClassCreateSchema), async (req, res) => {
    res.status(201).json(await classes.create(req.actor!, bodyOf(req, ClassCreateSchema)));
  });

  router.get('/admin/classes/:classId', requireRole('admin'), validateParams(ClassParams), async (req, res) => {
    res.json(await classes.getDetail(req.actor!, res.locals.params.classId));
  });

  router.post(
    '/admin/classes/:classId/enrolments',
    requireRole('admin'),
    validateParams(ClassParams),
    validateBody(EnrolSchema),
    async (req, res) => {
      res.json(await classes.enrol(req.actor!, res.locals.params.classId, bodyOf(req, EnrolSchema).userIds));
    },
  );

  router.delete('/admin/classes/:classId/enrolments/:userId', requireRole('admin'), validateParams(EnrolmentParams), async (req, res) => {
    await classes.unenrol(req.actor!, res.locals.params.classId, res.locals.params.userId);
    res.status(204).end();
  });

  return router;
}
