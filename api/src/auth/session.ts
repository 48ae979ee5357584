import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type pg from 'pg';
import type { RequestHandler } from 'express';

export const SESSION_COOKIE = 'pinfield.sid';
const TWO_WEEKS_MS = 14 * 24 * 60 * 60 * 1000;

/** Sessions kept in PostgreSQL so any API process can serve any request. */
export function createSessionMiddleware(options: { pool: pg.Pool; secret: string; secure: boolean }): RequestHandler {
  const PgStore = connectPgSimple(session);
  return session({
    name: SESSION_COOKIE,
    store: new PgStore({ pool: options.pool, tableName: 'sessions', createTableIfMissing: false, pruneSessionInterval: 60 * 15 }),
    secret: options.secret,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: undefined,
    cookie: { httpOnly: true, sameSite: 'lax', secure: options.secure, maxAge: TWO_WEEKS_MS },
  });
}

/** Replaces the session id before signing someone in, so a planted id never becomes a signed-in one. */
export function regenerate(req: Express.Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.regenerate((error) => (error ? reject(error) : resolve())));
}

export function saveSession(req: Express.Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.save((error) => (error ? reject(error) : resolve())));
}

export function destroySession(req: Express.Request): Promise<void> {
  return new Promise((resolve, reject) => req.session.destroy((error) => (error ? reject(error) : resolve())));
}
