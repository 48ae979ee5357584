import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { once } from 'node:events';
import { createServer } from 'node:net';
import { rm } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeMediaDir, makeVideo } from '../../tests/fixtures/media/generate';
import { createTestDatabase, type TestDatabase } from '../test/test-db';
import { buildProcessingRecording, recordingRow, silentLogger, TEST_SETTINGS, testStorage, waitFor } from './jobs/jobs.test-support';
import { createJobQueue } from './jobs/pg-boss-queue';
import type { ObjectStorage } from './storage/object-storage';

async function freePort(): Promise<number> {
  const server = createServer();
  server.listen(0, '127.0.0.1');
  await once(server, 'listening');
  const { port } = server.address() as { port: number };
  server.close();
  await once(server, 'close');
  return port;
}

interface Started {
  child: ChildProcessWithoutNullStreams;
  logs: () => string[];
}

async function startServer(entry: string, env: Record<string, string>): Promise<Started> {
  const child = spawn(process.execPath, ['--import', 'tsx', entry], { env: { PATH: process.env.PATH ?? '', ...env } });
  const lines: string[] = [];
  const collect = (chunk: Buffer) => lines.push(...chunk.toString().split('\n').filter(Boolean));
  child.stdout.on('data', collect);
  child.stderr.on('data', collect);
  return { child, logs: () => lines };
}

const messages = (started: Started) =>
  started.logs().map((line) => (line.startsWith('{') ? (JSON.parse(line) as { msg: string }).msg : line));

describe('the app and the worker as processes', { timeout: 120_000 }, () => {
  let database: TestDatabase;
  let storage: ObjectStorage;
  let dir: string;
  let prefix = '';
  const base = (port: number) => ({
    DATABASE_URL: database.url,
    PORT: String(port),
    S3_ENDPOINT: process.env.S3_ENDPOINT ?? '',
    S3_BUCKET: process.env.S3_BUCKET ?? '',
    WEB_DIST: '/nonexistent',
    LOG_LEVEL: 'info',
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
  });

  beforeAll(async () => {
    database = await createTestDatabase();
    storage = testStorage();
    dir = await makeMediaDir('server');
  });
  afterAll(async () => {
    if (prefix) await storage.deletePrefix(prefix);
    await database.drop();
    await rm(dir, { recursive: true, force: true });
  });

  it('npm start: the API answers, its in-process worker processes a recording, and SIGTERM stops both cleanly', async () => {
    const port = await freePort();
    const app = await startServer('api/src/server.ts', { ...base(port), WORKER: 'in-process' });
    await waitFor(async () => messages(app).includes('pinfield api listening') || app.child.exitCode !== null);
    expect(messages(app)).toEqual(
      expect.arrayContaining([
        'worker started: processing one recording at a time; abandoned uploads swept hourly',
        'pinfield api listening',
      ]),
    );
    expect((await fetch(`http://127.0.0.1:${port}/api/health`)).status).toBe(200);

    const recording = await buildProcessingRecording(
      database.knex,
      storage,
      await makeVideo({ dir, seconds: 1, width: 320, height: 180, fps: 30, codec: 'h264', audio: true }),
    );
    prefix = recording.prefix;
    const sender = await createJobQueue({
      databaseUrl: database.url,
      db: database.knex,
      settings: TEST_SETTINGS,
      logger: silentLogger,
      maintenance: false,
    });
    await sender.enqueueProcessing(recording.id);
    await sender.stop();
    await waitFor(async () => (await recordingRow(database.knex, recording.id))?.state === 'ready');

    app.child.kill('SIGTERM');
    const [code] = await once(app.child, 'exit');
    expect(code).toBe(0);
    expect(messages(app)).toEqual(expect.arrayContaining(['shutting down', 'worker stopped']));
  });

  it('WORKER=off: the API only queues, and npm run worker is the worker alone', async () => {
    const app = await startServer('api/src/server.ts', { ...base(await freePort()), WORKER: 'off' });
    await waitFor(async () => messages(app).includes('pinfield api listening') || app.child.exitCode !== null);
    expect(messages(app)).toContain('WORKER=off: recordings are queued here and processed by `npm run worker`');
    expect(messages(app)).not.toContain('worker started: processing one recording at a time; abandoned uploads swept hourly');
    app.child.kill('SIGTERM');
    expect((await once(app.child, 'exit'))[0]).toBe(0);

    const worker = await startServer('api/src/worker.ts', { ...base(await freePort()), WORKER: 'off' });
    await waitFor(async () => messages(worker).includes('pinfield worker ready; Ctrl-C stops it') || worker.child.exitCode !== null);
    expect(messages(worker)).toContain('worker started: processing one recording at a time; abandoned uploads swept hourly');
    worker.child.kill('SIGINT');
    expect((await once(worker.child, 'exit'))[0]).toBe(0);
    expect(messages(worker)).toContain('worker stopped');
  });

  it('a database without the job tables stops the start with the reason', async () => {
    const bare = await (await import('../test/test-db')).createEmptyDatabase();
    try {
      const app = await startServer('api/src/server.ts', { ...base(await freePort()), DATABASE_URL: bare.url });
      const [code] = await once(app.child, 'exit');
      expect(code).toBe(1);
      expect(app.logs().join('\n')).toMatch(
        /Could not start the job queue: The job queue tables are missing or out of date .*run the migrations \(npm run db:migrate\)/,
      );
    } finally {
      await bare.drop();
    }
  });
});
