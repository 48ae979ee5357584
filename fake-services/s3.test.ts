import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningFake } from './s3';
import { startS3Fake } from './s3';

process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';

const BUCKET = 'pinfield-test-media';
const APP_ORIGIN = 'http://127.0.0.1:4999';

let directory = '';
let fake: RunningFake;
let client: S3Client;

function makeClient(endpoint: string): S3Client {
  // The settings STACK.md requires against s3rver (no aws-chunked bodies).
  return new S3Client({
    endpoint,
    region: 'us-east-1',
    forcePathStyle: true,
    credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}

async function readBody(key: string, range?: string): Promise<{ bytes: Buffer; status: number | undefined }> {
  const out = await client.send(new GetObjectCommand({ Bucket: BUCKET, Key: key, Range: range }));
  const bytes = Buffer.from(await out.Body!.transformToByteArray());
  return { bytes, status: out.$metadata.httpStatusCode };
}

beforeAll(async () => {
  directory = await mkdtemp(join(tmpdir(), 'pinfield-s3-fake-'));
  fake = await startS3Fake({ port: 0, directory: join(directory, 'nested', 's3'), buckets: [{ name: BUCKET, corsOrigins: [APP_ORIGIN] }] });
  client = makeClient(fake.url);
});

afterAll(async () => {
  client?.destroy();
  await fake?.close();
  await rm(directory, { recursive: true, force: true });
});

describe('S3 fake', () => {
  it('creates the configured bucket', async () => {
    const out = await client.send(new HeadBucketCommand({ Bucket: BUCKET }));
    expect(out.$metadata.httpStatusCode).toBe(200);
    await expect(client.send(new HeadBucketCommand({ Bucket: 'no-such-bucket' }))).rejects.toThrow();
  });

  it('round-trips every byte value through PutObject and GetObject', async () => {
    const bytes = Buffer.alloc(70_000);
    for (let i = 0; i < bytes.length; i += 1) bytes[i] = (i * 31 + 7) % 256;
    await client.send(new PutObjectCommand({ Bucket: BUCKET, Key: 'media/blob.bin', Body: bytes }));
    const { bytes: back } = await readBody('media/blob.bin');
    expect(back.equals(bytes)).toBe(true);
  });

  it('accepts a presigned PUT sent with plain fetch', async () => {
    const url = await getSignedUrl(client, new PutObjectCommand({ Bucket: BUCKET, Key: 'uploads/clip.txt', ContentType: 'text/plain' }), {
      expiresIn: 300,
    });
    const response = await fetch(url, { method: 'PUT', body: 'presigned body ✓', headers: { 'Content-Type': 'text/plain' } });
    expect(response.status).toBe(200);
    expect(response.headers.get('etag')).toMatch(/^"[0-9a-f]{32}"$/);
    const { bytes } = await readBody('uploads/clip.txt');
    expect(bytes.toString('utf8')).toBe('presigned body ✓');
  });

  it('answers a Range GET with 206 and only the requested bytes', async () => {
    await client.send(new PutObjectCommand({ Bucket: BUCKET, Key: 'range.txt', Body: 'abcdefghijklmnopqrstuvwxyz' }));
    const { bytes, status } = await readBody('range.txt', 'bytes=2-5');
    expect(status).toBe(206);
    expect(bytes.toString('utf8')).toBe('cdef');
  });

  it('answers a CORS preflight from the allowed origin and exposes ETag on the real request', async () => {
    const objectUrl = `${fake.url}/${BUCKET}/range.txt`;
    const preflight = await fetch(objectUrl, {
      method: 'OPTIONS',
      headers: { Origin: APP_ORIGIN, 'Access-Control-Request-Method': 'PUT', 'Access-Control-Request-Headers': 'content-type' },
    });
    expect(preflight.status).toBe(200);
    expect(preflight.headers.get('access-control-allow-origin')).toMatch(/^(\*|http:\/\/127\.0\.0\.1:4999)$/);
    expect(preflight.headers.get('access-control-allow-methods')).toContain('PUT');
    expect(preflight.headers.get('access-control-allow-headers')).toContain('content-type');

    const actual = await fetch(objectUrl, { headers: { Origin: APP_ORIGIN } });
    expect(actual.headers.get('access-control-allow-origin')).toBe(APP_ORIGIN);
    expect(actual.headers.get('access-control-expose-headers')).toContain('ETag');
  });

  it('refuses a CORS preflight from another origin', async () => {
    const preflight = await fetch(`${fake.url}/${BUCKET}/range.txt`, {
      method: 'OPTIONS',
      headers: { Origin: 'http://127.0.0.1:5999', 'Access-Control-Request-Method': 'PUT' },
    });
    expect(preflight.status).toBe(403);
    expect(preflight.headers.get('access-control-allow-origin')).toBeNull();
  });

  it('keeps objects on disk across a restart', async () => {
    await client.send(new PutObjectCommand({ Bucket: BUCKET, Key: 'kept.txt', Body: 'still here' }));
    await fake.close();
    fake = await startS3Fake({
      port: 0,
      directory: join(directory, 'nested', 's3'),
      buckets: [{ name: BUCKET, corsOrigins: [APP_ORIGIN] }],
    });
    client.destroy();
    client = makeClient(fake.url);
    const { bytes } = await readBody('kept.txt');
    expect(bytes.toString('utf8')).toBe('still here');
  });

  it('rejects bad bucket settings with a specific message', async () => {
    const base = { port: 0, directory: join(directory, 'unused') };
    await expect(startS3Fake({ ...base, buckets: [{ name: 'Bad_Name', corsOrigins: [APP_ORIGIN] }] })).rejects.toThrow(
      'S3 bucket name "Bad_Name" is invalid',
    );
    await expect(startS3Fake({ ...base, buckets: [{ name: BUCKET, corsOrigins: ['http://127.0.0.1:4310/path'] }] })).rejects.toThrow(
      'is not an origin',
    );
    await expect(startS3Fake({ ...base, buckets: [{ name: BUCKET, corsOrigins: [] }] })).rejects.toThrow('needs at least one CORS origin');
    await expect(startS3Fake({ ...base, buckets: [{ name: BUCKET, corsOrigins: [APP_ORIGIN] }], listPageLimit: 0 })).rejects.toThrow(
      'S3 fake listPageLimit must be a whole number from 1 to 1000, not 0.',
    );
  });

  it('reports a port that is already taken', async () => {
    const port = Number(new URL(fake.url).port);
    await expect(
      startS3Fake({ port, directory: join(directory, 'other'), buckets: [{ name: BUCKET, corsOrigins: [APP_ORIGIN] }] }),
    ).rejects.toThrow(`S3 fake could not listen on 127.0.0.1:${port}: the address is already in use`);
  });
});
