import express, { type Request, type RequestHandler } from 'express';
import { AppError, ForbiddenError } from '../../errors';

/**
 * navigator.sendBeacon, the last report of a page being closed, cannot set headers: it posts a
 * text/plain body, so the CSRF token travels inside it and the Origin header is checked as well.
 * Only this one route reads the token from the body.
 */

/** Below the /api mount. */
export const VIEWING_BEACON_ROUTE = '/student/assignments/:assignmentId/viewing/beacon';
const BEACON_PATH = /^\/student\/assignments\/[^/]+\/viewing\/beacon\/?$/;

const isBeacon = (req: Request) => req.method === 'POST' && BEACON_PATH.test(req.path);

/** For csrf-sync's getTokenFromRequest: the X-CSRF-Token header, or the body's csrfToken on the beacon route. */
export function csrfTokenOf(req: Request): string | undefined {
  if (!isBeacon(req)) return req.get('x-csrf-token');
  const body: unknown = req.body;
  if (typeof body !== 'object' || body === null || !('csrfToken' in body)) return undefined;
  return typeof body.csrfToken === 'string' ? body.csrfToken : undefined;
}

/** Parses the beacon's text/plain body as JSON before the CSRF check needs its token (mounted at VIEWING_BEACON_ROUTE). */
export function beaconBody(limit: string): RequestHandler[] {
  return [
    express.text({ type: 'text/plain', limit }),
    (req, _res, next) => {
      if (typeof req.body !== 'string') return next();
      try {
        req.body = JSON.parse(req.body) as unknown;
        next();
      } catch {
        next(new AppError(400, 'malformed_json', 'The viewing report is not valid JSON.'));
      }
    },
  ];
}

/** The beacon is taken only from the app's own pages: Origin must be PUBLIC_URL's origin. */
export function sameOriginOnly(publicUrl: string): RequestHandler {
  const expected = new URL(publicUrl).origin;
  return (req, _res, next) => {
    const origin = req.get('origin');
    if (origin === expected) return next();
    next(
      new ForbiddenError(
        origin === undefined
          ? 'A viewing report sent without an Origin header is refused.'
          : `A viewing report from ${origin} is refused: only pages of ${expected} may send one.`,
        'origin_refused',
      ),
    );
  };
}
