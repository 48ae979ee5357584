import { Router } from 'express';
import { SetActiveSchema } from '@core/contracts';
import type { CsrfSync } from 'csrf-sync';
import { signedIn } from '../../middleware/access';
import { bodyOf, validateBody } from '../../middleware/validate';
import { ForbiddenError } from '../../errors';
import { saveSession } from '../../auth/session';
import { chooseActive } from '../../auth/actor';
import { presentMe } from './me.presenter';

export function meRoutes({ csrf }: { csrf: CsrfSync }): Router {
  const router = Router();

  router.get('/', signedIn(), (req, res) => {
    res.json(presentMe(req.actor!, csrf.generateToken(req)));
  });

  router.put('/active', signedIn(), validateBody(SetActiveSchema), async (req, res) => {
    const { schoolId, role } = bodyOf(req, SetActiveSchema);
    const actor = req.actor!;
    const membership = actor.memberships.find((m) => m.schoolId === schoolId);
    if (!membership) throw new ForbiddenError('You are not a member of that school.');
    if (!membership.roles.includes(role)) throw new ForbiddenError(`You do not have the ${role} role in ${membership.schoolName}.`);
    req.session.activeSchoolId = schoolId;
    req.session.activeRole = role;
    await saveSession(req);
    const active = chooseActive(actor.memberships, { schoolId, role })!;
    res.json(presentMe({ ...actor, active }, csrf.generateToken(req)));
  });

  return router;
}
