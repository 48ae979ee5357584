import { createHash } from 'node:crypto';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { S3Client, S3ClientConfig } from '@aws-sdk/client-s3';
import { createObjectStorage, type ObjectStorage } from '@api/storage/object-storage';
import { startS3Fake, type RunningFake } from './s3';

process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';

export const TEST_BUCKET = 'pinfield-test-media';
export const TEST_ORIGIN = 'http://127.0.0.1:4999';
export const MIB = 1024 * 1024;

/** A started S3 fake on a free port in a fresh folder, with the API's own storage module pointed at it. */
export interface S3TestRig {
  fake: RunningFake;
  directory: string;
  storage: ObjectStorage;
  /** The storage module's S3 client, for the commands the module does not wrap. */
  client: S3Client;
  /** Stops and starts the fake again on the same folder (a new port); `storage` and `client` follow. */
  restart(): Promise<void>;
  close(): Promise<void>;
}

function storageFor(url: string, secretAccessKey = 'S3RVER', accessKeyId = 'S3RVER'): ObjectStorage {
  return createObjectStorage({ endpoint: url, region: 'us-east-1', bucket: TEST_BUCKET, accessKeyId, secretAccessKey });
}

export async function startS3Rig(options: { listPageLimit?: number } = {}): Promise<S3TestRig> {
  const directory = await mkdtemp(join(tmpdir(), 'pinfield-s3-rig-'));
  const start = (): Promise<RunningFake> =>
    startS3Fake({
      port: 0,
      directory: join(directory, 's3'),
      buckets: [{ name: TEST_BUCKET, corsOrigins: [TEST_ORIGIN] }],
      listPageLimit: options.listPageLimit,
    });
  const fake = await start();
  const storage = storageFor(fake.url);
  const rig: S3TestRig = {
    fake,
    directory,
    storage,
    client: storage.client,
    async restart() {
      rig.client.destroy();
      await rig.fake.close();
      rig.fake = await start();
      rig.storage = storageFor(rig.fake.url);
      rig.client = rig.storage.client;
    },
    async close() {
      rig.client.destroy();
      await rig.fake.close();
      await rm(directory, { recursive: true, force: true });
    },
  };
  return rig;
}

/** S3Client settings for the rig's fake, as the storage module uses them (for a client with other options). */
export function clientSettings(rig: S3TestRig): S3ClientConfig {
  return {
    endpoint: rig.fake.url,
    region: 'us-east-1',
    forcePathStyle: true,
    credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  };
}

/** The same storage module with other credentials, to see the fake refuse them. */
export function storageWithCredentials(rig: S3TestRig, accessKeyId: string, secretAccessKey: string): ObjectStorage {
  return storageFor(rig.fake.url, secretAccessKey, accessKeyId);
}

/** Bytes that differ per part and per position, so a part out of place or cut short shows. */
export function partBytes(partNumber: number, size: number): Buffer {
  const bytes = Buffer.alloc(size);
  for (let i = 0; i < size; i += 1) bytes[i] = (i * 31 + partNumber * 97) % 251;
  return bytes;
}

export function md5Hex(bytes: Buffer): string {
  return createHash('md5').update(bytes).digest('hex');
}

/** PUTs a part to its presigned URL as the browser does (plain fetch, no SDK). */
export async function putPart(url: string, body: Buffer, headers: Record<string, string> = {}): Promise<Response> {
  return fetch(url, { method: 'PUT', body, headers });
}

/** The `<Code>` of an S3 error document. */
export function errorCode(xml: string): string | undefined {
  return /<Code>([^<]*)<\/Code>/.exec(xml)?.[1];
}
