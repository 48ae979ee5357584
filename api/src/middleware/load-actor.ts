import type { RequestHandler } from 'express';
import type { Db } from '../db/knex';
import { chooseActive, type ActorMembership } from '../auth/actor';
import { findActorData, type UserRow } from '../auth/actor.repository';
import { noInvalidation, type CacheInvalidation } from '../auth/cache-invalidation';

type ActorData = { user: UserRow; memberships: ActorMembership[] };
const ACTORS_KEPT = 50_000;

/**
 * Attaches `req.actor` when the session belongs to a person who still has a school membership.
 * The person and their memberships are read once and then served from memory while the
 * invalidation bus vouches for them: a changed name, role, membership or school is dropped in
 * every process within MAX_STALENESS_MS (see cache-invalidation.ts).
 */
export function loadActor(db: Db, invalidation: CacheInvalidation = noInvalidation): RequestHandler {
  const cache = new Map<string, ActorData>();
  invalidation.subscribe((event) => {
    if (event.kind === 'all') cache.clear();
    else if (event.kind === 'user') cache.delete(event.id);
    else if (event.kind === 'school') {
      for (const [userId, data] of cache) if (data.memberships.some((m) => m.schoolId === event.id)) cache.delete(userId);
    }
  });

  async function actorData(userId: string): Promise<ActorData | undefined> {
    const hit = invalidation.trusted() ? cache.get(userId) : undefined;
    if (hit) return hit;
    const epoch = invalidation.epoch();
    const data = await findActorData(db, userId);
    if (data && invalidation.epoch() === epoch) {
      if (cache.size >= ACTORS_KEPT) cache.delete(cache.keys().next().value as string);
      cache.set(userId, data);
    }
    return data;
  }

  return async (req, _res, next) => {
    const userId = req.session?.userId;
    if (!userId) return next();
    const data = await actorData(userId);
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
