import { createWriteStream } from 'node:fs';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import {
  AbortMultipartUploadCommand,
  CompleteMultipartUploadCommand,
  CreateMultipartUploadCommand,
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  ListPartsCommand,
  PutObjectCommand,
  S3Client,
  UploadPartCommand,
} from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { AppError } from '../errors';

export interface StorageConfig {
  endpoint: string;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
}

export interface StoredPart {
  partNumber: number;
  size: number;
  etag: string;
}

export interface SignGetOptions {
  expiresInSeconds: number;
  /** Overrides the stored type in the response (S3 `response-content-type`). */
  contentType?: string;
  /** e.g. an attachment disposition for the teacher's download of the original. */
  contentDisposition?: string;
}

/** S3 could not be reached: the caller keeps its data and tries later. */
export class StorageUnavailableError extends AppError {
  constructor(cause: unknown) {
    super(503, 'storage_unavailable', 'File storage is not reachable right now. Nothing was lost: try again in a minute.');
    this.cause = cause;
  }
}

const NETWORK_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENOTFOUND', 'EAI_AGAIN', 'EPIPE']);

function isNetworkFailure(error: unknown): boolean {
  const e = error as { code?: string; name?: string; $metadata?: { httpStatusCode?: number }; cause?: unknown };
  if (e?.code && NETWORK_CODES.has(e.code)) return true;
  if (e?.name === 'TimeoutError' || (e?.$metadata?.httpStatusCode ?? 0) >= 500) return true;
  return e?.cause !== undefined && e.cause !== error && isNetworkFailure(e.cause);
}

function isNotFound(error: unknown): boolean {
  const e = error as { name?: string; $metadata?: { httpStatusCode?: number } };
  return e?.name === 'NotFound' || e?.name === 'NoSuchKey' || e?.$metadata?.httpStatusCode === 404;
}

/** Runs one S3 call, turning "storage is down" into a 503 the pages can explain. */
async function call<T>(run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (error) {
    throw isNetworkFailure(error) ? new StorageUnavailableError(error) : error;
  }
}

export function createS3Client(config: StorageConfig): S3Client {
  return new S3Client({
    endpoint: config.endpoint,
    region: config.region,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    forcePathStyle: true,
    // Without these the SDK sends aws-chunked bodies that S3-compatible stores may keep verbatim,
    // and presigned PUTs carry an empty-body checksum the browser's part would not match.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 2,
  });
}

/** The bucket the product keeps every recording object in; the API only signs and inspects. */
export function createObjectStorage(config: StorageConfig) {
  const client = createS3Client(config);
  const Bucket = config.bucket;

  async function listParts(key: string, uploadId: string): Promise<StoredPart[]> {
    const parts: StoredPart[] = [];
    let marker: string | undefined;
    do {
      const page = await call(() =>
        client.send(new ListPartsCommand({ Bucket, Key: key, UploadId: uploadId, PartNumberMarker: marker, MaxParts: 1000 })),
      );
      for (const part of page.Parts ?? []) {
        parts.push({ partNumber: part.PartNumber ?? 0, size: part.Size ?? 0, etag: part.ETag ?? '' });
      }
      marker = page.IsTruncated ? page.NextPartNumberMarker : undefined;
    } while (marker);
    return parts;
  }

  async function deleteKeys(keys: string[]): Promise<void> {
    for (let i = 0; i < keys.length; i += 1000) {
      const chunk = keys.slice(i, i + 1000);
      await call(() => client.send(new DeleteObjectsCommand({ Bucket, Delete: { Objects: chunk.map((Key) => ({ Key })), Quiet: true } })));
    }
  }

  return {
    bucket: Bucket,
    client,

    async createMultipart(key: string, contentType: string): Promise<string> {
      const created = await call(() => client.send(new CreateMultipartUploadCommand({ Bucket, Key: key, ContentType: contentType })));
      if (!created.UploadId) throw new Error('Storage did not return an upload id.');
      return created.UploadId;
    },

    /** A URL for exactly one part of exactly `contentLength` bytes (the length is signed into it). */
    signPart(key: string, uploadId: string, partNumber: number, contentLength: number, expiresInSeconds: number): Promise<string> {
      const command = new UploadPartCommand({ Bucket, Key: key, UploadId: uploadId, PartNumber: partNumber, ContentLength: contentLength });
      return getSignedUrl(client, command, { expiresIn: expiresInSeconds, signableHeaders: new Set(['content-length']) });
    },

    listParts,

    async completeMultipart(key: string, uploadId: string, parts: { partNumber: number; etag: string }[]): Promise<void> {
      await call(() =>
        client.send(
          new CompleteMultipartUploadCommand({
            Bucket,
            Key: key,
            UploadId: uploadId,
            MultipartUpload: { Parts: parts.map((part) => ({ PartNumber: part.partNumber, ETag: part.etag })) },
          }),
        ),
      );
    },

    /** Aborts a multipart upload; one that is already gone counts as aborted. */
    async abortMultipart(key: string, uploadId: string): Promise<void> {
      try {
        await call(() => client.send(new AbortMultipartUploadCommand({ Bucket, Key: key, UploadId: uploadId })));
      } catch (error) {
        if (!isNotFound(error) && (error as { name?: string }).name !== 'NoSuchUpload') throw error;
      }
    },

    /** Size and type of a stored object, or null when there is none. */
    async head(key: string): Promise<{ size: number; contentType: string | undefined } | null> {
      try {
        const head = await call(() => client.send(new HeadObjectCommand({ Bucket, Key: key })));
        return { size: head.ContentLength ?? 0, contentType: head.ContentType };
      } catch (error) {
        if (isNotFound(error)) return null;
        throw error;
      }
    },

    signGet(key: string, options: SignGetOptions): Promise<string> {
      const command = new GetObjectCommand({
        Bucket,
        Key: key,
        ResponseContentType: options.contentType,
        ResponseContentDisposition: options.contentDisposition,
      });
      return getSignedUrl(client, command, { expiresIn: options.expiresInSeconds });
    },

    async put(key: string, body: Buffer | Readable, contentType: string, contentLength?: number): Promise<void> {
      await call(() =>
        client.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: contentLength })),
      );
    },

    /** The first `length` bytes of an object (for sniffing its type), or fewer if it is shorter. */
    async readStart(key: string, length: number): Promise<Buffer> {
      const object = await call(() => client.send(new GetObjectCommand({ Bucket, Key: key, Range: `bytes=0-${length - 1}` })));
      return Buffer.from(await object.Body!.transformToByteArray());
    },

    async download(key: string, filePath: string): Promise<void> {
      const object = await call(() => client.send(new GetObjectCommand({ Bucket, Key: key })));
      await pipeline(object.Body as Readable, createWriteStream(filePath));
    },

    async listKeys(prefix: string): Promise<string[]> {
      const keys: string[] = [];
      let token: string | undefined;
      do {
        const page = await call(() => client.send(new ListObjectsV2Command({ Bucket, Prefix: prefix, ContinuationToken: token })));
        for (const object of page.Contents ?? []) if (object.Key) keys.push(object.Key);
        token = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (token);
      return keys;
    },

    deleteKeys,

    /** Deletes every object under a prefix; returns how many there were. */
    async deletePrefix(prefix: string): Promise<number> {
      const keys = await this.listKeys(prefix);
      if (keys.length > 0) await deleteKeys(keys);
      return keys.length;
    },
  };
}

export type ObjectStorage = ReturnType<typeof createObjectStorage>;

export function storageConfigFromEnv(env: {
  S3_ENDPOINT: string;
  S3_REGION: string;
  S3_BUCKET: string;
  S3_ACCESS_KEY_ID: string;
  S3_SECRET_ACCESS_KEY: string;
}): StorageConfig {
  return {
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION,
    bucket: env.S3_BUCKET,
    accessKeyId: env.S3_ACCESS_KEY_ID,
    secretAccessKey: env.S3_SECRET_ACCESS_KEY,
  };
}
