import type { RequestHandler } from 'express';
import type { Db } from '../db/knex';
import { chooseActive } from '../auth/actor';
import { findActorData } from '../auth/actor.repository';

/** Attaches `req.actor` when the session belongs to a person who still has a school membership. */
export function loadActor(db: Db): RequestHandler {
  return async (req, _res, next) => {
    const userId = req.session?.userId;
    if (!userId) return next();
    const data = await findActorData(db, userId);
    const active = data && chooseActive(data.memberships, { schoolId: req.session.activeSchoolId, role: req.session.activeRole });
    if (!data || !active) {
      // The person or their last membership was removed: the session no longer signs anyone in.
      delete req.session.userId;
      return next();
    }
    req.actor = { userId: data.user.id, email: data.user.email, name: data.user.name, memberships: data.memberships, active };
    next();
  };
}
