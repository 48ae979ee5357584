/**
 * Upload benchmark (a script, not a test): `npm run bench:upload`, against the local profile that
 * `npm start` runs (PostgreSQL 4311, S3 fake 4312; DATABASE_URL and S3_* override them).
 * Writes 1 GiB of random bytes to a temporary file, then:
 *  1. the product's path: the real app (createApp) on an ephemeral port, a demo teacher signed in
 *     through the e-mail link flow, POST /api/uploads, parts signed one by one and PUT straight to
 *     storage five at a time, POST .../complete (which lists, joins and checks the parts);
 *  2. the simplest upload: the same bytes as one presigned PutObject to the same fake.
 * Both objects and the benchmark's rows are deleted afterwards. Last line:
 * `upload: <MiB/s> MiB/s, single put: <MiB/s> MiB/s, ratio: <upload/single put>`.
 */
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { request } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { once } from 'node:events';
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { PutObjectCommand } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { partLength, partSizeFor } from '../../core/recordings';
import type { UploadDto } from '../../core/contracts';
import { createApp } from '../../api/src/app';
import { createKnex } from '../../api/src/db/knex';
import { loadEnv } from '../../api/src/env';
import { createLogger } from '../../api/src/logger';
import type { JobQueue } from '../../api/src/jobs/job-queue';
import type { MailMessage } from '../../api/src/mail/mailer';
import { createObjectStorage, storageConfigFromEnv } from '../../api/src/storage/object-storage';

const MIB = 1024 * 1024;
const SIZE = 1024 * MIB;
const PARALLEL = 5;
const TEACHER = process.env.BENCH_TEACHER ?? 'ada.quillfeather@fernhollow.example';

process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
const env = loadEnv({
  ...process.env,
  NODE_ENV: 'development',
  LOG_LEVEL: 'silent',
  SIGNIN_LIMIT_PER_EMAIL: '1000',
  WEB_DIST: '/nonexistent',
});

/** 1 GiB of random bytes, streamed to disk; returns the SHA-256 of the first part, as the browser computes it. */
async function writeRandomFile(path: string): Promise<string> {
  const out = createWriteStream(path);
  const firstPart = createHash('sha256');
  const firstPartSize = partSizeFor(SIZE);
  for (let written = 0; written < SIZE; written += 8 * MIB) {
    const chunk = randomBytes(Math.min(8 * MIB, SIZE - written));
    if (written < firstPartSize) firstPart.update(chunk.subarray(0, firstPartSize - written));
    if (!out.write(chunk)) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
  return firstPart.digest('hex');
}

/** PUTs a byte range of the file to a presigned URL, streamed from disk; returns the ETag. */
function putRange(url: string, path: string, start: number, length: number): Promise<string> {
  return new Promise((resolve, reject) => {
    const req = request(url, { method: 'PUT', headers: { 'Content-Length': length } }, (res) => {
      res.resume();
      res.on('end', () =>
        res.statusCode === 200 ? resolve(String(res.headers.etag)) : reject(new Error(`PUT answered ${res.statusCode}`)),
      );
    });
    req.on('error', reject);
    createReadStream(path, { start, end: start + length - 1 }).pipe(req);
  });
}

/** A browser-like API client: a cookie jar and the CSRF token. */
function apiClient(base: string) {
  const cookies = new Map<string, string>();
  let csrf = '';
  async function call(method: string, path: string, body?: unknown) {
    const res = await fetch(`${base}${path}`, {
      method,
      headers: {
        cookie: [...cookies].map(([k, v]) => `${k}=${v}`).join('; '),
        'x-csrf-token': csrf,
        ...(body === undefined ? {} : { 'content-type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const at = pair!.indexOf('=');
      cookies.set(pair!.slice(0, at), pair!.slice(at + 1));
    }
    const text = await res.text();
    const json = text ? JSON.parse(text) : undefined;
    if (res.status >= 400) throw new Error(`${method} ${path} answered ${res.status}: ${text}`);
    return json;
  }
  return {
    call,
    async signIn(email: string, sent: MailMessage[]) {
      csrf = (await call('GET', '/api/auth/csrf')).csrfToken;
      await call('POST', '/api/auth/email-link', { email });
      const mail = [...sent].reverse().find((m) => m.to === email);
      const token = mail?.text.match(/token=([A-Za-z0-9_-]+)/)?.[1];
      if (!token) throw new Error(`No sign-in link was e-mailed to ${email}: is the local demo seeded (npm start)?`);
      csrf = (await call('POST', '/api/auth/email-link/verify', { token })).csrfToken;
    },
  };
}

async function main(): Promise<void> {
  const dir = await mkdtemp(join(tmpdir(), 'pinfield-upload-bench-'));
  const path = join(dir, 'bench.mp4');
  const db = createKnex(env.DATABASE_URL, { min: 0, max: 10 });
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5 });
  const storage = createObjectStorage(storageConfigFromEnv(env));
  const sent: MailMessage[] = [];
  // Processing is not measured here: queued ids are only kept, so no worker picks up random bytes.
  const queued: string[] = [];
  const jobs: JobQueue = { enqueueProcessing: async (id) => void queued.push(id), stop: async () => {} };
  const mailer = { send: async (message: MailMessage) => void sent.push(message), close() {} };
  const app = createApp({ env, db, pool, mailer, logger: createLogger('silent'), storage, jobs, demoAccounts: [] });
  const server = app.listen(0, '127.0.0.1');
  await once(server, 'listening');
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const singleKey = `bench/single-put-${randomUUID()}`;
  let upload: UploadDto | undefined;
  let completed = false;
  const client = apiClient(base);

  try {
    console.log(`writing ${SIZE / MIB} MiB of random bytes to ${path}`);
    const firstPartSha256 = await writeRandomFile(path);
    await client.signIn(TEACHER, sent);

    const started = performance.now();
    upload = (await client.call('POST', '/api/uploads', {
      fileName: 'Upload benchmark.mp4',
      size: SIZE,
      lastModified: Date.now(),
      type: 'video/mp4',
      firstPartSha256,
    })) as UploadDto;
    const current = upload;
    const next = { part: 1 };
    const parts: { partNumber: number; etag: string }[] = [];
    await Promise.all(
      Array.from({ length: PARALLEL }, async () => {
        while (next.part <= current.partCount) {
          const partNumber = next.part++;
          const signed = await client.call('POST', `/api/uploads/${current.id}/parts/${partNumber}`);
          const length = partLength(current.size, current.partSize, partNumber);
          parts.push({ partNumber, etag: await putRange(signed.url, path, (partNumber - 1) * current.partSize, length) });
        }
      }),
    );
    parts.sort((a, b) => a.partNumber - b.partNumber);
    const partsSent = performance.now();
    const recording = await client.call('POST', `/api/uploads/${current.id}/complete`, { parts });
    const completedAt = performance.now();
    completed = true;
    const uploadSeconds = (completedAt - started) / 1000;
    if (recording.state !== 'processing' || recording.sizeBytes !== SIZE || !queued.includes(recording.id)) {
      throw new Error(`The upload did not end as a queued recording: ${JSON.stringify(recording)}`);
    }
    console.log(
      `multipart: ${current.partCount} parts of ${current.partSize / MIB} MiB, ${PARALLEL} at a time, ${uploadSeconds.toFixed(2)} s ` +
        `(completing: ${((completedAt - partsSent) / 1000).toFixed(2)} s)`,
    );

    const url = await getSignedUrl(
      storage.client,
      new PutObjectCommand({ Bucket: storage.bucket, Key: singleKey, ContentLength: SIZE, ContentType: 'video/mp4' }),
      { expiresIn: 3600, signableHeaders: new Set(['content-length']) },
    );
    const singleStarted = performance.now();
    await putRange(url, path, 0, SIZE);
    const singleSeconds = (performance.now() - singleStarted) / 1000;
    const stored = await storage.head(singleKey);
    if (stored?.size !== SIZE) throw new Error(`The single PUT stored ${stored?.size} bytes, not ${SIZE}.`);
    console.log(`single put: ${singleSeconds.toFixed(2)} s`);

    const uploadRate = SIZE / MIB / uploadSeconds;
    const singleRate = SIZE / MIB / singleSeconds;
    console.log(
      `upload: ${uploadRate.toFixed(2)} MiB/s, single put: ${singleRate.toFixed(2)} MiB/s, ratio: ${(uploadRate / singleRate).toFixed(2)}`,
    );
  } finally {
    if (upload && !completed) await client.call('DELETE', `/api/uploads/${upload.id}`).catch(() => undefined);
    if (upload) {
      await storage.deleteKeys([upload.key, singleKey]);
      await db('uploads').where({ id: upload.id }).delete();
      await db('recordings').where({ id: upload.recordingId }).delete();
    }
    await client.call('POST', '/api/auth/sign-out').catch(() => undefined);
    server.close();
    server.closeAllConnections();
    await Promise.allSettled([db.destroy(), pool.end(), rm(dir, { recursive: true, force: true })]);
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
