import pg from 'pg';
import { randomUUID } from 'node:crypto';
import type { Logger } from 'pino';

/**
 * Cross-process cache invalidation over PostgreSQL LISTEN/NOTIFY. Triggers (migration
 * 20261204090100) announce every change to sessions, users, memberships, schools, classes, enrolments
 * and assignments on one channel, whoever wrote it. Each process listens on a connection of its own.
 *
 * A cache entry may be used only while this process is provably caught up: it sends itself a ping
 * through the same channel every PING_EVERY_MS. PostgreSQL delivers notifications in commit order, so
 * when a ping comes back, every change committed before it was sent has already been applied here.
 * `trusted()` is true only while a ping sent less than MAX_STALENESS_MS ago has come back; any cache
 * reading it is therefore never more than that behind the database, in every process. A lost
 * connection drops every cached entry (notifications may have been missed) until it is back.
 */

export const INVALIDATION_CHANNEL = 'pinfield_cache';
/** Below the one second the issue allows, with room for a busy event loop. */
export const MAX_STALENESS_MS = 800;
const PING_EVERY_MS = 150;
/** The listener's application_name in pg_stat_activity. */
export const LISTENER_NAME = 'pinfield-cache-invalidation';
const RECONNECT_DELAYS_MS = [100, 500, 2000, 5000];

export type InvalidationEvent =
  | { kind: 'all' }
  /** id: md5 of the session id (the id itself never goes over the channel). */
  | { kind: 'session'; id: string }
  | { kind: 'user' | 'school' | 'class' | 'assignment'; id: string }
  | { kind: 'enrolment'; classId: string; studentId: string };

export interface CacheInvalidation {
  /** Called synchronously for every change, in commit order. Returns an unsubscribe function. */
  subscribe(listener: (event: InvalidationEvent) => void): () => void;
  /** Whether cached entries may be used right now (see above). */
  trusted(): boolean;
  /** Grows with every change heard: a loader compares it before and after a read to know whether a change raced it. */
  epoch(): number;
  close(): Promise<void>;
}

const SIMPLE_KINDS = new Set(['session', 'user', 'school', 'class', 'assignment']);

/** Reads a trigger's payload ('user:<uuid>', 'enrolment:<class>:<student>'); null for anything else. */
export function parseInvalidation(payload: string): InvalidationEvent | null {
  const [kind, first, second] = payload.split(':');
  if (!kind || !first) return null;
  if (kind === 'enrolment') return second ? { kind, classId: first, studentId: second } : null;
  if (SIMPLE_KINDS.has(kind)) return { kind: kind as 'user', id: first };
  return null;
}

/** Trusted never: for code paths that must always read the database. */
export const noInvalidation: CacheInvalidation = {
  subscribe: () => () => undefined,
  trusted: () => false,
  epoch: () => 0,
  close: async () => undefined,
};

/**
 * Starts listening with the pool's connection settings. It stops by itself once the pool is ended, so
 * whoever owns the pool (server shutdown, a test's close) needs to do nothing more.
 */
export function createCacheInvalidation(options: { pool: pg.Pool; logger: Logger }): CacheInvalidation {
  const { pool, logger } = options;
  const token = randomUUID();
  const listeners = new Set<(event: InvalidationEvent) => void>();
  let client: pg.Client | null = null;
  let listening = false;
  let triggersInstalled = false;
  let closed = false;
  let changes = 0;
  let confirmedSentAt = 0;
  let nextPing = 0;
  const pingsInFlight = new Map<number, number>();
  let failures = 0;
  let reconnectTimer: NodeJS.Timeout | null = null;

  function emit(event: InvalidationEvent): void {
    changes += 1;
    for (const listener of listeners) listener(event);
  }

  function onNotification(message: pg.Notification): void {
    const payload = message.payload ?? '';
    if (payload.startsWith('ping:')) {
      const [, from, n] = payload.split(':');
      const sentAt = from === token ? pingsInFlight.get(Number(n)) : undefined;
      if (sentAt !== undefined) {
        confirmedSentAt = Math.max(confirmedSentAt, sentAt);
        for (const key of pingsInFlight.keys()) if (key <= Number(n)) pingsInFlight.delete(key);
      }
      return;
    }
    const event = parseInvalidation(payload);
    // An unreadable payload still means something changed: drop everything rather than guess.
    emit(event ?? { kind: 'all' });
  }

  function lost(error?: unknown): void {
    if (client) {
      client.removeAllListeners();
      client.on('error', () => undefined);
      void client.end().catch(() => undefined);
    }
    client = null;
    listening = false;
    confirmedSentAt = 0;
    pingsInFlight.clear();
    emit({ kind: 'all' });
    if (closed || pool.ending) return;
    if (error) logger.warn({ err: error }, 'cache invalidation connection lost; caches are off until it is back');
    const delay = RECONNECT_DELAYS_MS[Math.min(failures, RECONNECT_DELAYS_MS.length - 1)]!;
    failures += 1;
    reconnectTimer = setTimeout(() => void connect(), delay);
    reconnectTimer.unref();
  }

  async function connect(): Promise<void> {
    reconnectTimer = null;
    if (closed || pool.ending) return;
    const next = new pg.Client({ ...pool.options, application_name: LISTENER_NAME });
    next.on('error', (error) => {
      if (client === next) lost(error);
    });
    next.on('end', () => {
      if (client === next) lost();
    });
    next.on('notification', onNotification);
    client = next;
    try {
      await next.connect();
      await next.query(`LISTEN ${INVALIDATION_CHANNEL}`);
      const { rows } = await next.query<{ n: number }>("SELECT count(*)::int AS n FROM pg_trigger WHERE tgname LIKE 'pinfield_cache_%'");
      triggersInstalled = (rows[0]?.n ?? 0) > 0;
      if (!triggersInstalled) logger.warn('cache invalidation triggers are missing (migrations not run?): caches stay off');
      if (client !== next) return;
      listening = true;
      failures = 0;
      ping();
    } catch (error) {
      if (client === next) lost(error);
    }
  }

  function ping(): void {
    if (!client || !listening) return;
    nextPing += 1;
    pingsInFlight.set(nextPing, Date.now());
    const current = client;
    current.query('SELECT pg_notify($1, $2)', [INVALIDATION_CHANNEL, `ping:${token}:${nextPing}`]).catch((error: unknown) => {
      if (client === current) lost(error);
    });
  }

  const timer = setInterval(() => {
    if (pool.ending) {
      void invalidation.close();
      return;
    }
    // A ping stuck for long means a stuck connection: start over.
    const oldest = Math.min(...pingsInFlight.values());
    if (listening && pingsInFlight.size > 0 && Date.now() - oldest > 10_000)
      lost(new Error('cache invalidation pings stopped coming back'));
    else ping();
  }, PING_EVERY_MS);
  timer.unref();

  const invalidation: CacheInvalidation = {
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    trusted: () => triggersInstalled && listening && Date.now() - confirmedSentAt < MAX_STALENESS_MS,
    epoch: () => changes,
    async close() {
      if (closed) return;
      closed = true;
      clearInterval(timer);
      if (reconnectTimer) clearTimeout(reconnectTimer);
      const current = client;
      client = null;
      listening = false;
      if (current) {
        current.removeAllListeners();
        current.on('error', () => undefined);
        await current.end().catch(() => undefined);
      }
      listeners.clear();
    },
  };

  void connect();
  return invalidation;
}
