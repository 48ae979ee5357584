import session, { type SessionData } from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import { createHash } from 'node:crypto';
import type pg from 'pg';
import type { RequestHandler } from 'express';
import { noInvalidation, type CacheInvalidation } from './cache-invalidation';

export const SESSION_COOKIE = 'pinfield.sid';
const TWO_WEEKS_MS = 14 * 24 * 60 * 60 * 1000;
/**
 * A rolling session's expiry is written again only when it would move by more than this: the row
 * may then expire up to this much before the cookie says (of two weeks), and a request costs no write.
 */
export const SESSION_TOUCH_SLACK_MS = 10 * 60 * 1000;
const SESSIONS_KEPT = 100_000;

interface CachedSession {
  json: string;
  /** The row's expiry as last written or read (the row is not served past it). */
  expiresMs: number;
}

/** The id never goes over the invalidation channel: the triggers send its md5. */
export const sessionDigest = (sid: string) => createHash('md5').update(sid).digest('hex');

const cookieExpiry = (sess: SessionData) => {
  const expires = sess.cookie?.expires;
  return expires ? new Date(expires).getTime() : Date.now();
};

/**
 * connect-pg-simple with a read cache: a session read once is served from memory while the
 * invalidation bus vouches for it (a sign-out or any change to the row in any process drops it
 * within MAX_STALENESS_MS, see cache-invalidation.ts). Writes go to the table first, always.
 */
function cachedStore(pool: pg.Pool, invalidation: CacheInvalidation) {
  const PgStore = connectPgSimple(session);
  // By session id; `digests` finds an entry from the md5 a trigger sends (computed once per entry, not per request).
  const cache = new Map<string, CachedSession & { digest: string }>();
  const digests = new Map<string, string>();
  // The expiry this process last wrote per session: a touch that would barely move it is skipped.
  const written = new Map<string, number>();

  const forget = (sid: string) => {
    const entry = cache.get(sid);
    if (entry) digests.delete(entry.digest);
    cache.delete(sid);
  };
  invalidation.subscribe((event) => {
    if (event.kind === 'all') {
      cache.clear();
      digests.clear();
    } else if (event.kind === 'session') {
      const sid = digests.get(event.id);
      if (sid !== undefined) forget(sid);
    }
  });
  const keep = (sid: string, sess: SessionData) => {
    if (cache.size >= SESSIONS_KEPT) forget(cache.keys().next().value as string);
    const digest = sessionDigest(sid);
    cache.set(sid, { json: JSON.stringify(sess), expiresMs: cookieExpiry(sess), digest });
    digests.set(digest, sid);
  };
  const wrote = (sid: string, expiresMs: number) => {
    if (written.size >= SESSIONS_KEPT) written.delete(written.keys().next().value as string);
    written.set(sid, expiresMs);
  };

  class CachedPgStore extends PgStore {
    override get(sid: string, callback: (err: unknown, session?: SessionData | null) => void): void {
      const hit = invalidation.trusted() ? cache.get(sid) : undefined;
      if (hit && hit.expiresMs > Date.now()) {
        callback(null, JSON.parse(hit.json) as SessionData);
        return;
      }
      const epoch = invalidation.epoch();
      super.get(sid, (err, sess) => {
        if (!err && sess && invalidation.epoch() === epoch) keep(sid, sess);
        callback(err, sess);
      });
    }

    override set(sid: string, sess: SessionData, callback?: (err?: unknown) => void): void {
      forget(sid);
      const epoch = invalidation.epoch();
      super.set(sid, sess, (err) => {
        if (!err) {
          wrote(sid, cookieExpiry(sess));
          if (invalidation.epoch() === epoch) keep(sid, sess);
        }
        callback?.(err);
      });
    }

    override destroy(sid: string, callback?: (err?: unknown) => void): void {
      forget(sid);
      written.delete(sid);
      super.destroy(sid, callback);
    }

    override touch(sid: string, sess: SessionData, callback?: () => void): void {
      const wanted = cookieExpiry(sess);
      const last = written.get(sid);
      if (last !== undefined && wanted - last < SESSION_TOUCH_SLACK_MS) {
        callback?.();
        return;
      }
      super.touch(sid, sess, () => {
        wrote(sid, wanted);
        const hit = cache.get(sid);
        if (hit) hit.expiresMs = Math.max(hit.expiresMs, wanted);
        callback?.();
      });
    }
  }

  return new CachedPgStore({ pool, tableName: 'sessions', createTableIfMissing: false, pruneSessionInterval: 60 * 15 });
}

/** Sessions kept in PostgreSQL so any API process can serve any request; read through a cache the invalidation bus keeps honest. */
export function createSessionMiddleware(options: {
  pool: pg.Pool;
  secret: string;
  secure: boolean;
  invalidation?: CacheInvalidation;
}): RequestHandler {
  return session({
    name: SESSION_COOKIE,
    store: cachedStore(options.pool, options.invalidation ?? noInvalidation),
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
