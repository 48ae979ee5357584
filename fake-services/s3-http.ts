import type { IncomingMessage, ServerResponse } from 'node:http';
import type { S3rverFilesystemStore } from 's3rver';
import S3Error from 's3rver/lib/models/error.js';
import { parseQuery } from './s3-sigv4';

/** One request to the fake, path-style: `/<bucket>/<key>?<query>` (vhost buckets are off). */
export interface S3Target {
  method: string;
  /** Percent-encoded, as sent. */
  path: string;
  rawQuery: string;
  /** First value of each query parameter, decoded. */
  query: Map<string, string>;
  bucket: string | undefined;
  key: string | undefined;
}

function decodePath(value: string): string {
  try {
    return decodeURIComponent(value);
  } catch {
    throw new S3Error('InvalidURI', "Couldn't parse the specified URI.");
  }
}

export function parseTarget(req: IncomingMessage): S3Target {
  const url = req.url ?? '/';
  const at = url.indexOf('?');
  const path = at < 0 ? url : url.slice(0, at);
  const rawQuery = at < 0 ? '' : url.slice(at + 1);
  const query = new Map<string, string>();
  for (const [name, value] of parseQuery(rawQuery)) if (!query.has(name)) query.set(name, value);
  const slash = path.indexOf('/', 1);
  const bucketPart = slash < 0 ? path.slice(1) : path.slice(1, slash);
  const keyPart = slash < 0 ? '' : path.slice(slash + 1);
  return {
    method: (req.method ?? 'GET').toUpperCase(),
    path,
    rawQuery,
    query,
    bucket: bucketPart === '' ? undefined : decodePath(bucketPart),
    key: keyPart === '' ? undefined : decodePath(keyPart),
  };
}

/** Reads and drops a request body, so an early answer is not cut off by a reset while the client still sends. */
export async function drain(req: IncomingMessage): Promise<void> {
  if (req.readableEnded || req.destroyed) return;
  await new Promise<void>((resolve) => {
    req
      .on('end', resolve)
      .on('error', () => resolve())
      .on('close', resolve);
    req.resume();
  });
}

/** The bucket's stored CORS rule for this request, applied as s3rver's own CORS middleware does. */
export async function applyCors(store: S3rverFilesystemStore, target: S3Target, req: IncomingMessage, res: ServerResponse): Promise<void> {
  const origin = req.headers.origin;
  if (!origin || !target.bucket || target.method === 'OPTIONS') return;
  const config = await store.getSubresource(target.bucket, undefined, 'cors').catch(() => null);
  const rule = config?.matchRule(origin, target.method);
  if (!rule) return;
  res.setHeader('Access-Control-Allow-Origin', rule.hasWildcardOrigin ? '*' : origin);
  if (rule.exposeHeaders.length > 0) res.setHeader('Access-Control-Expose-Headers', rule.exposeHeaders.join(', '));
  if (rule.maxAgeSeconds !== undefined) res.setHeader('Access-Control-Max-Age', String(rule.maxAgeSeconds));
  res.setHeader('Access-Control-Allow-Credentials', 'true');
  res.setHeader('Vary', 'Origin, Access-Control-Request-Headers, Access-Control-Request-Method');
}

export function sendXml(res: ServerResponse, status: number, xml: string, method: string): void {
  const body = `<?xml version="1.0" encoding="UTF-8"?>\n${xml}`;
  res.statusCode = status;
  res.setHeader('Content-Type', 'application/xml');
  res.setHeader('Content-Length', Buffer.byteLength(body));
  res.end(method === 'HEAD' ? undefined : body);
}

export function sendEmpty(res: ServerResponse, status: number): void {
  res.statusCode = status;
  res.end();
}

/** Answers with S3's `<Error>` document; the body is drained first (see `drain`). */
export async function sendError(res: ServerResponse, req: IncomingMessage, error: S3Error, method: string): Promise<void> {
  await drain(req);
  if (res.headersSent || res.destroyed) return;
  // As s3rver does: error answers keep only CORS, Vary and x-amz-* headers.
  for (const name of res.getHeaderNames()) if (!/^(access-control-|vary$|x-amz-)/i.test(name)) res.removeHeader(name);
  const xml = error.toXML();
  res.statusCode = error.status;
  res.setHeader('Content-Type', 'application/xml');
  res.setHeader('Content-Length', Buffer.byteLength(xml));
  res.end(method === 'HEAD' ? undefined : xml);
}

/** A bucket-level answer for a bucket that does not exist. */
export function noSuchBucket(bucket: string): S3Error {
  return new S3Error('NoSuchBucket', 'The specified bucket does not exist', { BucketName: bucket });
}
