import pg from 'pg';
import request from 'supertest';
import { CookieAccessInfo } from 'cookiejar';
import type { Express } from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { loadEnv } from '../env';
import { createLogger } from '../logger';
import type { JobQueue } from '../jobs/job-queue';
import { createTestApp, signedInClient, type Client, type TestApp } from '../../test/test-app';
import { buildMember } from '../../test/factories';
import { createCacheInvalidation, LISTENER_NAME, parseInvalidation, type InvalidationEvent } from './cache-invalidation';
import { SESSION_COOKIE } from './session';
import { databaseUrl } from '../features/responses/responses.test-support';

let t: TestApp;
let other: { app: Express; pool: pg.Pool };

/** A second API process on the same database: its own pool, caches and invalidation listener. */
function secondProcess(testApp: TestApp) {
  const url = databaseUrl(testApp);
  const pool = new pg.Pool({ connectionString: url, max: 3 });
  const env = loadEnv({
    NODE_ENV: 'test',
    DATABASE_URL: url,
    S3_ENDPOINT: process.env.S3_ENDPOINT,
    S3_BUCKET: process.env.S3_BUCKET,
    LOG_LEVEL: 'silent',
    WEB_DIST: '/nonexistent',
  });
  const jobs: JobQueue = { enqueueProcessing: async () => undefined, stop: async () => undefined };
  const mailer = { send: async () => undefined, close: () => undefined };
  const app = createApp({
    env,
    db: testApp.db,
    pool,
    mailer,
    logger: createLogger('silent'),
    storage: testApp.storage,
    jobs,
    demoAccounts: [],
  });
  return { app, pool };
}

const sessionCookie = (client: Client) => `${SESSION_COOKIE}=${client.agent.jar.getCookie(SESSION_COOKIE, CookieAccessInfo.All)?.value}`;

/** Polls until `done` holds; returns how long it took, or throws after `limitMs`. */
async function within(limitMs: number, done: () => Promise<boolean>): Promise<number> {
  const started = Date.now();
  while (!(await done())) {
    if (Date.now() - started > limitMs) throw new Error(`not within ${limitMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
  return Date.now() - started;
}

beforeAll(async () => {
  t = await createTestApp();
  other = secondProcess(t);
  // Both processes' listeners are up and caught up.
  await new Promise((resolve) => setTimeout(resolve, 300));
});
afterAll(async () => {
  await other.pool.end();
  await t.close();
});

describe('parseInvalidation', () => {
  it('reads the payloads the triggers send, and nothing else', () => {
    expect(parseInvalidation('user:7f0c')).toEqual({ kind: 'user', id: '7f0c' });
    expect(parseInvalidation('session:ab12')).toEqual({ kind: 'session', id: 'ab12' });
    expect(parseInvalidation('enrolment:c1:s1')).toEqual({ kind: 'enrolment', classId: 'c1', studentId: 's1' });
    expect(parseInvalidation('enrolment:c1')).toBeNull();
    expect(parseInvalidation('lesson:1')).toBeNull();
    expect(parseInvalidation('')).toBeNull();
  });
});

describe('caches across API processes', () => {
  it('serves a session and actor from memory: a row deleted behind the triggers’ back is still served', async () => {
    const person = await buildMember(t.db, { roles: ['teacher'] });
    const client = await signedInClient(t, person.email);
    const cookie = sessionCookie(client);
    expect((await request(other.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
    await t.db.raw('ALTER TABLE sessions DISABLE TRIGGER USER');
    try {
      await t.db('sessions').delete();
      expect((await request(other.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
    } finally {
      await t.db.raw('ALTER TABLE sessions ENABLE TRIGGER USER');
    }
  });

  it('a sign-out in one process signs the session out in every other within a second', async () => {
    const person = await buildMember(t.db, { roles: ['student'] });
    const client = await signedInClient(t, person.email);
    const cookie = sessionCookie(client);
    expect((await request(other.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
    expect((await request(other.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
    expect((await client.send('post', '/api/auth/sign-out')).status).toBeLessThan(300);
    const took = await within(1000, async () => (await request(other.app).get('/api/me').set('Cookie', cookie)).status === 401);
    expect(took).toBeLessThan(1000);
  });

  it('a role changed in the database reaches the actor in every process within a second', async () => {
    const person = await buildMember(t.db, { roles: ['teacher', 'coordinator'] });
    const client = await signedInClient(t, person.email);
    const cookie = sessionCookie(client);
    const roles = async () => (await request(other.app).get('/api/me').set('Cookie', cookie)).body.memberships[0].roles as string[];
    expect(await roles()).toEqual(['teacher', 'coordinator']);
    await t
      .db('memberships')
      .where({ user_id: person.id })
      .update({ roles: ['teacher'] });
    await within(1000, async () => (await roles()).length === 1);
    await t.db('memberships').where({ user_id: person.id }).delete();
    await within(1000, async () => (await request(other.app).get('/api/me').set('Cookie', cookie)).status === 401);
  });
});

describe('the listener', () => {
  it('is trusted only while connected and caught up; a lost connection drops everything and it comes back', async () => {
    const pool = new pg.Pool({ connectionString: databaseUrl(t), max: 1 });
    const bus = createCacheInvalidation({ pool, logger: createLogger('silent') });
    const events: InvalidationEvent[] = [];
    bus.subscribe((event) => events.push(event));
    try {
      await within(2000, async () => bus.trusted());
      const before = bus.epoch();
      await t.db('users').insert({ email: 'listener-check@test.example', name: 'Listener Check' });
      await t.db('users').where({ email: 'listener-check@test.example' }).update({ name: 'Listener Checked' });
      await within(1000, async () => events.some((e) => e.kind === 'user'));
      expect(bus.epoch()).toBeGreaterThan(before);

      events.length = 0;
      await t.db.raw('SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = ? AND datname = current_database()', [
        LISTENER_NAME,
      ]);
      await within(1000, async () => !bus.trusted());
      await within(1000, async () => events.some((e) => e.kind === 'all'));
      await within(5000, async () => bus.trusted());
    } finally {
      await bus.close();
      await pool.end();
    }
  });
});
