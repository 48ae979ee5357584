import { Router } from 'express';
import type { Knex } from 'knex';
import { SchoolUpdateSchema, type SchoolDto } from '@core/contracts';
import { requireRole } from '../../middleware/access';
import { bodyOf, validateBody } from '../../middleware/validate';

const COLUMNS = ['id', 'name', 'time_zone as timeZone', 'locale', 'email_domains as emailDomains'];

/** Mounted at /api: the active school's own settings. */
export function schoolsRoutes(db: Knex): Router {
  const router = Router();

  router.get('/admin/school', requireRole('admin'), async (req, res) => {
    res.json((await db('schools').where({ id: req.actor!.active.schoolId }).first(COLUMNS)) as SchoolDto);
  });

  router.patch('/admin/school', requireRole('admin'), validateBody(SchoolUpdateSchema), async (req, res) => {
    const { emailDomains } = bodyOf(req, SchoolUpdateSchema);
    const query = db('schools').where({ id: req.actor!.active.schoolId });
    const [row] =
      emailDomains === undefined
        ? [await query.first(COLUMNS)]
        : await query.update({ email_domains: [...new Set(emailDomains)] }).returning(COLUMNS);
    res.json(row as SchoolDto);
  });

  return router;
}
