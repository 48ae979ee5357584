import type { RequestHandler } from 'express';
import type { Role } from '@core/roles';
import { ForbiddenError, UnauthenticatedError } from '../errors';
import { ROLE_LABELS } from '@core/roles';

/** Marks a middleware as a route's access rule, so a test can prove every route declares one. */
export const ACCESS_RULE = Symbol('pinfield.accessRule');
type AccessRule = RequestHandler & { [ACCESS_RULE]: string };

function rule(description: string, handler: RequestHandler): AccessRule {
  return Object.assign(handler, { [ACCESS_RULE]: description });
}

/** Anyone, signed in or not. */
export const publicAccess = (): AccessRule => rule('public', (_req, _res, next) => next());

/** Any signed-in person, whatever their role. */
export const signedIn = (): AccessRule => rule('signed-in', (req, _res, next) => next(req.actor ? undefined : new UnauthenticatedError()));

/** Signed in, and the active school membership holds one of these roles. */
export function requireRole(...roles: Role[]): AccessRule {
  const names = roles.map((role) => ROLE_LABELS[role].toLowerCase());
  return rule(`roles:${roles.join(',')}`, (req, _res, next) => {
    if (!req.actor) return next(new UnauthenticatedError());
    if (!roles.some((role) => req.actor!.active.roles.includes(role))) {
      return next(new ForbiddenError(`This needs the ${names.join(' or ')} role in ${req.actor.active.schoolName}.`));
    }
    next();
  });
}
