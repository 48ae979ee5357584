import { mkdir } from 'node:fs/promises';
import { createServer } from 'node:http';
import S3rver from 's3rver';
import { createS3Handler } from './s3-front';
import type { RunningFake } from './server-lifecycle';
import { closeHttpServer, httpUrl, listenOn } from './server-lifecycle';

export type { RunningFake } from './server-lifecycle';

export interface S3FakeBucket {
  name: string;
  /** Browser origins allowed to GET/PUT/POST/HEAD objects (e.g. the app's public URL). */
  corsOrigins: string[];
}

export interface S3FakeOptions {
  port: number;
  host?: string;
  /** Where objects live on disk; created if missing and kept across restarts. */
  directory: string;
  buckets: S3FakeBucket[];
  /**
   * Most parts (ListParts) or uploads (ListMultipartUploads) in one answer. S3 answers at most 1,000,
   * the default; tests set fewer to make clients follow the pages without uploading 1,001 parts.
   */
  listPageLimit?: number;
}

const CLIENT_GONE = new Set(['ECONNRESET', 'EPIPE', 'ECONNABORTED', 'ERR_STREAM_PREMATURE_CLOSE']);

const BUCKET_NAME = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;

/** Checks a bucket list up front so a typo fails with a sentence, not an XML error later. */
export function validateBuckets(buckets: S3FakeBucket[]): void {
  if (buckets.length === 0) throw new Error('S3 fake needs at least one bucket.');
  const seen = new Set<string>();
  for (const bucket of buckets) {
    if (!BUCKET_NAME.test(bucket.name) || bucket.name.includes('..')) {
      throw new Error(
        `S3 bucket name "${bucket.name}" is invalid: use 3-63 lowercase letters, digits, dots or hyphens, starting and ending with a letter or digit.`,
      );
    }
    if (seen.has(bucket.name)) throw new Error(`S3 bucket "${bucket.name}" is listed twice.`);
    seen.add(bucket.name);
    // An empty list would leave a CORS rule from an earlier run on disk, so require one.
    if (bucket.corsOrigins.length === 0) {
      throw new Error(`S3 bucket "${bucket.name}" needs at least one CORS origin (the app's public URL).`);
    }
    for (const origin of bucket.corsOrigins) assertOrigin(origin, bucket.name);
  }
}

function assertOrigin(origin: string, bucket: string): void {
  let parsed: URL | undefined;
  try {
    parsed = new URL(origin);
  } catch {
    parsed = undefined;
  }
  if (!parsed || !['http:', 'https:'].includes(parsed.protocol) || parsed.origin !== origin) {
    throw new Error(
      `CORS origin "${origin}" for S3 bucket "${bucket}" is not an origin: write scheme, host and optional port only, e.g. http://127.0.0.1:4310.`,
    );
  }
}

function escapeXml(value: string): string {
  return value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** Bucket CORS for browser uploads: multipart needs PUT per part and the ETag of each part. */
export function corsXml(origins: string[]): string {
  const allowed = origins.map((origin) => `<AllowedOrigin>${escapeXml(origin)}</AllowedOrigin>`).join('');
  const methods = ['GET', 'PUT', 'POST', 'HEAD'].map((method) => `<AllowedMethod>${method}</AllowedMethod>`).join('');
  return (
    '<CORSConfiguration><CORSRule>' +
    `${allowed}${methods}<AllowedHeader>*</AllowedHeader><ExposeHeader>ETag</ExposeHeader>` +
    '<MaxAgeSeconds>600</MaxAgeSeconds></CORSRule></CORSConfiguration>'
  );
}

/**
 * Starts s3rver on loopback with the given buckets (and their CORS rules) provisioned, behind a front
 * (s3-front.ts) that adds what production S3 does and s3rver 3.7.1 lacks for resumable browser uploads:
 * ListParts, AbortMultipartUpload, ListMultipartUploads, NoSuchUpload, SigV4 signature checks, nosniff.
 */
export async function startS3Fake(options: S3FakeOptions): Promise<RunningFake> {
  const host = options.host ?? '127.0.0.1';
  validateBuckets(options.buckets);
  const pageLimit = options.listPageLimit ?? 1000;
  if (!Number.isInteger(pageLimit) || pageLimit < 1 || pageLimit > 1000) {
    throw new Error(`S3 fake listPageLimit must be a whole number from 1 to 1000, not ${options.listPageLimit}.`);
  }
  await mkdir(options.directory, { recursive: true });

  const s3 = new S3rver({
    address: host,
    port: options.port,
    directory: options.directory,
    // Silent: s3rver logs every request; only unexpected server errors are printed below.
    silent: true,
    vhostBuckets: false,
    configureBuckets: options.buckets.map((bucket) => ({ name: bucket.name, configs: [corsXml(bucket.corsOrigins)] })),
  });
  s3.on('error', (error: Error & { status?: number; code?: string }) => {
    // A client that hangs up mid-request (a browser tab closed during a part) is not the fake's fault.
    if (CLIENT_GONE.has(error.code ?? '') || error.code?.startsWith('HPE_')) return;
    if (error.status === undefined || error.status >= 500) console.error('[s3 fake] request failed:', error);
  });
  await s3.configureBuckets();

  // Our own server instead of s3rver.run(): run() never settles when the port is taken.
  const server = createServer(createS3Handler(s3, { pageLimit }));
  const port = await listenOn(server, options.port, host, 'S3 fake');
  return { url: httpUrl(host, port), close: () => closeHttpServer(server) };
}
