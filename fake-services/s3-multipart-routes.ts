import type { IncomingMessage, ServerResponse } from 'node:http';
import type { S3rverFilesystemStore } from 's3rver';
import S3Error from 's3rver/lib/models/error.js';
import type { S3Target } from './s3-http';
import { applyCors, noSuchBucket, sendEmpty, sendXml } from './s3-http';
import { listPartsXml, listUploadsXml } from './s3-multipart-xml';
import type { AuthKind } from './s3-sigv4';
import type { StoredUpload, UploadsStore } from './s3-uploads-store';
import { invalidPartNumber, isPartNumber, noSuchUpload } from './s3-uploads-store';

/**
 * The multipart operations s3rver 3.7.1 lacks (ListParts, AbortMultipartUpload, ListMultipartUploads),
 * and the checks it skips before its own UploadPart and CompleteMultipartUpload (an unknown, aborted,
 * completed or other key's uploadId is NoSuchUpload, as on S3).
 */

export interface MultipartRequest {
  target: S3Target;
  req: IncomingMessage;
  res: ServerResponse;
  uploads: UploadsStore;
  store: S3rverFilesystemStore;
  auth: AuthKind;
  /** Most parts or uploads in one answer (S3: 1,000). */
  pageLimit: number;
}

function integerParam(query: Map<string, string>, name: string, fallback: number): number {
  const raw = query.get(name);
  if (raw === undefined) return fallback;
  const value = /^\d{1,10}$/.test(raw) ? Number(raw) : NaN;
  if (!Number.isInteger(value) || value > 2_147_483_647) {
    throw new S3Error('InvalidArgument', `Argument ${name} must be an integer between 0 and 2147483647`, {
      ArgumentName: name,
      ArgumentValue: raw,
    });
  }
  return value;
}

function byteOrder(a: string, b: string): number {
  return Buffer.compare(Buffer.from(a), Buffer.from(b));
}

async function requireUpload({ target, uploads }: MultipartRequest, bucket: string, key: string): Promise<StoredUpload> {
  const uploadId = target.query.get('uploadId') ?? '';
  const upload = await uploads.find(bucket, uploadId);
  // An upload id belongs to one key: using it with another is NoSuchUpload on S3 too.
  if (!upload || upload.key !== key) throw noSuchUpload(uploadId);
  return upload;
}

async function listParts(request: MultipartRequest, bucket: string, key: string): Promise<void> {
  const { target, uploads, res } = request;
  const marker = integerParam(target.query, 'part-number-marker', 0);
  const maxParts = Math.min(integerParam(target.query, 'max-parts', request.pageLimit), request.pageLimit);
  const upload = await requireUpload(request, bucket, key);
  const after = (await uploads.parts(upload)).filter((part) => part.partNumber > marker);
  const parts = after.slice(0, maxParts);
  const xml = listPartsXml({
    upload,
    marker,
    maxParts,
    parts,
    truncated: after.length > parts.length,
    encodingType: target.query.get('encoding-type'),
  });
  sendXml(res, 200, xml, target.method);
}

async function abortUpload(request: MultipartRequest, bucket: string, key: string): Promise<void> {
  const upload = await requireUpload(request, bucket, key);
  await request.uploads.abort(upload);
  sendEmpty(request.res, 204);
}

async function listUploads({ target, uploads, res, pageLimit }: MultipartRequest, bucket: string): Promise<void> {
  const prefix = target.query.get('prefix') ?? '';
  const delimiter = target.query.get('delimiter') || undefined;
  const keyMarker = target.query.get('key-marker') ?? '';
  // S3 ignores upload-id-marker without key-marker.
  const uploadIdMarker = keyMarker === '' ? '' : (target.query.get('upload-id-marker') ?? '');
  const maxUploads = Math.min(integerParam(target.query, 'max-uploads', pageLimit), pageLimit);

  const all = (await uploads.list(bucket)).filter((upload) => upload.key.startsWith(prefix));
  const sameKey = all.filter((upload) => upload.key === keyMarker);
  const markerIndex = sameKey.findIndex((upload) => upload.uploadId === uploadIdMarker);
  const isAfterMarker = (upload: StoredUpload): boolean => {
    const order = byteOrder(upload.key, keyMarker);
    if (order !== 0) return order > 0 && !(delimiter && keyMarker.endsWith(delimiter) && upload.key.startsWith(keyMarker));
    if (uploadIdMarker === '') return false;
    return markerIndex >= 0 ? sameKey.indexOf(upload) > markerIndex : upload.uploadId > uploadIdMarker;
  };

  const listed: StoredUpload[] = [];
  const commonPrefixes: string[] = [];
  let truncated = false;
  let next: { key: string; uploadId?: string } | undefined;
  for (const upload of keyMarker === '' ? all : all.filter(isAfterMarker)) {
    const cut = delimiter ? upload.key.indexOf(delimiter, prefix.length) : -1;
    const common = cut >= 0 && delimiter ? upload.key.slice(0, cut + delimiter.length) : undefined;
    if (common !== undefined && commonPrefixes.includes(common)) continue;
    if (listed.length + commonPrefixes.length >= maxUploads) {
      truncated = true;
      break;
    }
    if (common !== undefined) {
      commonPrefixes.push(common);
      next = { key: common };
    } else {
      listed.push(upload);
      next = { key: upload.key, uploadId: upload.uploadId };
    }
  }
  const xml = listUploadsXml({
    bucket,
    prefix,
    delimiter,
    keyMarker,
    uploadIdMarker,
    maxUploads,
    uploads: listed,
    commonPrefixes,
    truncated,
    nextKeyMarker: next?.key,
    nextUploadIdMarker: next?.uploadId,
    encodingType: target.query.get('encoding-type'),
  });
  sendXml(res, 200, xml, target.method);
}

/** Checks before s3rver stores a part: S3 needs the length up front and a live upload of this key. */
async function checkUploadPart(request: MultipartRequest, bucket: string, key: string): Promise<void> {
  const partNumber = request.target.query.get('partNumber') ?? '';
  if (!isPartNumber(partNumber)) throw invalidPartNumber(partNumber);
  if (request.req.headers['content-length'] === undefined) {
    throw new S3Error('MissingContentLength', 'You must provide the Content-Length HTTP header.');
  }
  await requireUpload(request, bucket, key);
}

/**
 * Answers ListParts, AbortMultipartUpload and ListMultipartUploads, and refuses UploadPart and
 * CompleteMultipartUpload for an upload that is not there. Returns false to hand the request on to s3rver.
 */
export async function routeMultipart(request: MultipartRequest): Promise<boolean> {
  const { target, store } = request;
  const { bucket, key, method, query } = target;
  if (!bucket) return false;
  const forBucket = key === undefined && query.has('uploads') && (method === 'GET' || method === 'HEAD');
  const forUpload = key !== undefined && query.has('uploadId') && !query.has('uploads');
  if (!forBucket && !forUpload) return false;
  if (!(await store.getBucket(bucket))) throw noSuchBucket(bucket);
  const answeredHere = forBucket || method === 'GET' || method === 'HEAD' || method === 'DELETE';
  if (answeredHere && request.auth === 'v2') {
    // Only V4 is checked here; s3rver's V2 check sits inside its own routes.
    throw new S3Error('InvalidRequest', 'The authorization mechanism you have provided is not supported. Please use AWS4-HMAC-SHA256.');
  }

  // Answers written here carry the bucket's CORS headers; s3rver adds its own to the rest.
  if (answeredHere) await applyCors(store, target, request.req, request.res);
  if (forBucket) {
    await listUploads(request, bucket);
    return true;
  }
  if (key === undefined) return false;
  switch (method) {
    case 'GET':
    case 'HEAD':
      await listParts(request, bucket, key);
      return true;
    case 'DELETE':
      await abortUpload(request, bucket, key);
      return true;
    case 'PUT':
      // UploadPartCopy is left to s3rver, which answers NotImplemented.
      if (request.req.headers['x-amz-copy-source'] === undefined) await checkUploadPart(request, bucket, key);
      return false;
    case 'POST':
      await requireUpload(request, bucket, key);
      return false;
    default:
      return false;
  }
}
