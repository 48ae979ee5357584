import pg from 'pg';
import request from 'supertest';
import type { Express } from 'express';
import type { Knex } from 'knex';
import { createApp } from '../src/app';
import { loadEnv } from '../src/env';
import { createLogger } from '../src/logger';
import type { Mailer, MailMessage } from '../src/mail/mailer';
import { createTestDatabase, type TestDatabase } from './test-db';
import { createObjectStorage, storageConfigFromEnv, type ObjectStorage } from '../src/storage/object-storage';
import type { JobQueue } from '../src/jobs/job-queue';

export interface TestApp {
  app: Express;
  db: Knex;
  /** Every e-mail the app sent, in order. */
  sent: MailMessage[];
  /** The test profile's S3 fake (started by `npm test`). */
  storage: ObjectStorage;
  /** Recording ids queued for processing, in order (no worker runs in API tests). */
  enqueued: string[];
  close(): Promise<void>;
}

/** The real app on a fresh database, with e-mail captured in memory instead of sent over SMTP. */
export async function createTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const database: TestDatabase = await createTestDatabase();
  const sent: MailMessage[] = [];
  const mailer: Mailer = {
    async send(message) {
      sent.push(message);
    },
    close() {},
  };
  const pool = new pg.Pool({ connectionString: database.url, max: 3 });
  const config = loadEnv({
    NODE_ENV: 'test',
    // The S3 fake of the test profile: npm test passes its address to this phase.
    S3_ENDPOINT: process.env.S3_ENDPOINT,
    S3_BUCKET: process.env.S3_BUCKET,
    DATABASE_URL: database.url,
    LOG_LEVEL: 'silent',
    SIGNIN_LIMIT_PER_EMAIL: '1000',
    WEB_DIST: '/nonexistent',
    ...env,
  });
  const storage = createObjectStorage(storageConfigFromEnv(config));
  const enqueued: string[] = [];
  const jobs: JobQueue = {
    async enqueueProcessing(recordingId) {
      if (!enqueued.includes(recordingId)) enqueued.push(recordingId);
    },
    async stop() {},
  };
  const app = createApp({ env: config, db: database.knex, pool, mailer, logger: createLogger('silent'), storage, jobs, demoAccounts: [] });
  return {
    app,
    db: database.knex,
    sent,
    storage,
    enqueued,
    async close() {
      await pool.end();
      await database.drop();
    },
  };
}

/** A browser-like client: keeps cookies and sends the CSRF token on every state-changing request. */
export class Client {
  readonly agent: ReturnType<typeof request.agent>;
  private csrfToken = '';

  constructor(
    private readonly testApp: TestApp,
    private readonly address = '127.0.0.1',
  ) {
    this.agent = request.agent(testApp.app);
  }

  async refreshCsrf(): Promise<string> {
    const res = await this.agent.get('/api/auth/csrf').set('X-Forwarded-For', this.address);
    this.csrfToken = res.body.csrfToken;
    return this.csrfToken;
  }

  get(path: string) {
    return this.agent.get(path);
  }

  async send(method: 'post' | 'put' | 'patch' | 'delete', path: string, body?: unknown) {
    if (!this.csrfToken) await this.refreshCsrf();
    const req = this.agent[method](path).set('X-CSRF-Token', this.csrfToken);
    return body === undefined ? req : req.send(body as object);
  }

  /** Signs in through the real e-mail link flow: request, read the captured mail, press the button. */
  async signIn(email: string) {
    const requested = await this.send('post', '/api/auth/email-link', { email });
    if (requested.status !== 202) throw new Error(`sign-in request failed: ${requested.status} ${JSON.stringify(requested.body)}`);
    const token = lastLinkToken(this.testApp.sent, email);
    const verified = await this.send('post', '/api/auth/email-link/verify', { token });
    if (verified.status !== 200) throw new Error(`sign-in failed: ${verified.status} ${JSON.stringify(verified.body)}`);
    this.csrfToken = verified.body.csrfToken;
    return verified.body;
  }
}

/** The token in the newest link e-mailed to an address. */
export function lastLinkToken(sent: MailMessage[], email: string): string {
  const mail = [...sent].reverse().find((m) => m.to === email);
  const match = mail?.text.match(/token=([A-Za-z0-9_-]+)/);
  if (!match?.[1]) throw new Error(`no link e-mailed to ${email}`);
  return match[1];
}

export async function signedInClient(testApp: TestApp, email: string): Promise<Client> {
  const client = new Client(testApp);
  await client.signIn(email);
  return client;
}
