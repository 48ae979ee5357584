import { DeleteObjectsCommand, HeadObjectCommand, ListMultipartUploadsCommand, ListPartsCommand, S3Client } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';

// Real files and sockets on a shared 2-core machine: a generous ceiling, no timing is asserted.
vi.setConfig({ testTimeout: 30_000, hookTimeout: 30_000 });
import type { S3TestRig } from './s3-test-fixture';
import {
  TEST_BUCKET,
  TEST_ORIGIN,
  clientSettings,
  errorCode,
  md5Hex,
  partBytes,
  putPart,
  startS3Rig,
  storageWithCredentials,
} from './s3-test-fixture';

let rig: S3TestRig;

beforeAll(async () => {
  rig = await startS3Rig();
});

afterEach(() => {
  vi.useRealTimers();
});

afterAll(async () => {
  await rig?.close();
});

describe('S3 fake: presigned URLs expire', () => {
  it('refuses a part URL and a GET URL presigned for 1 second once that second has passed (403 "Request has expired")', async () => {
    const key = 'expiry/clip';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    await rig.storage.put('expiry/poster.jpg', Buffer.from('jpeg bytes'), 'image/jpeg');
    // One clock for signer and fake (same process): set, not waited for.
    const signedAt = Math.floor(Date.now() / 1000) * 1000;
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(signedAt);
    const partUrl = await rig.storage.signPart(key, uploadId, 1, 10, 1);
    const getUrl = await rig.storage.signGet('expiry/poster.jpg', { expiresInSeconds: 1 });
    // ListParts is answered by the fake's own front, not s3rver: its expiry check is the front's.
    const listUrl = await getSignedUrl(rig.client, new ListPartsCommand({ Bucket: TEST_BUCKET, Key: key, UploadId: uploadId }), {
      expiresIn: 1,
    });

    vi.setSystemTime(signedAt + 500);
    expect((await putPart(partUrl, Buffer.alloc(10, 1))).status).toBe(200);
    expect((await fetch(getUrl)).status).toBe(200);
    expect((await fetch(listUrl)).status).toBe(200);

    vi.setSystemTime(signedAt + 2000);
    const latePart = await putPart(partUrl, Buffer.alloc(10, 2), { Origin: TEST_ORIGIN });
    expect(latePart.status).toBe(403);
    // The browser can read the refusal: CORS headers come with it.
    expect(latePart.headers.get('access-control-allow-origin')).toBe(TEST_ORIGIN);
    const body = await latePart.text();
    expect(errorCode(body)).toBe('AccessDenied');
    expect(body).toContain('<Message>Request has expired</Message>');
    const lateGet = await fetch(getUrl);
    expect(lateGet.status).toBe(403);
    expect(errorCode(await lateGet.text())).toBe('AccessDenied');
    const lateList = await fetch(listUrl);
    expect(lateList.status).toBe(403);
    expect(await lateList.text()).toContain('<Message>Request has expired</Message>');

    vi.useRealTimers();
    // The refused second PUT did not replace the stored part.
    expect(await rig.storage.listParts(key, uploadId)).toEqual([{ partNumber: 1, size: 10, etag: `"${md5Hex(Buffer.alloc(10, 1))}"` }]);
    await rig.storage.abortMultipart(key, uploadId);
  });
});

describe('S3 fake: a part URL is good for its signed length only', () => {
  it('refuses a body of another length with 403 SignatureDoesNotMatch, as S3 does when content-length is signed', async () => {
    const key = 'length/clip';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    // The API's signPart: getSignedUrl with signableHeaders content-length.
    const url = await rig.storage.signPart(key, uploadId, 1, 1000, 300);
    expect(new URL(url).searchParams.get('X-Amz-SignedHeaders')).toBe('content-length;host');

    for (const size of [999, 1001, 5 * 1024 * 1024]) {
      const response = await putPart(url, partBytes(1, size), { Origin: TEST_ORIGIN });
      expect(response.status).toBe(403);
      expect(errorCode(await response.text())).toBe('SignatureDoesNotMatch');
    }
    expect(await rig.storage.listParts(key, uploadId)).toEqual([]);

    // Another part number in the same URL is a different request: refused too.
    const moved = new URL(url);
    moved.searchParams.set('partNumber', '2');
    expect((await putPart(moved.toString(), partBytes(1, 1000))).status).toBe(403);

    const exact = await putPart(url, partBytes(1, 1000), { Origin: TEST_ORIGIN });
    expect(exact.status).toBe(200);
    // Uppy reads each part's ETag from the browser: CORS must expose it.
    expect(exact.headers.get('access-control-allow-origin')).toBe(TEST_ORIGIN);
    expect(exact.headers.get('access-control-expose-headers')).toContain('ETag');
    expect(exact.headers.get('etag')).toBe(`"${md5Hex(partBytes(1, 1000))}"`);
    await rig.storage.abortMultipart(key, uploadId);
  });
});

describe('S3 fake: the multipart routes check signatures like the others', () => {
  it('refuses a wrong secret and an unknown access key, and leaves the upload alone', async () => {
    const key = 'signed/clip';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    const wrongSecret = storageWithCredentials(rig, 'S3RVER', 'not-the-secret');
    const stranger = storageWithCredentials(rig, 'AKIDSTRANGER', 'S3RVER');
    const refusal = (promise: Promise<unknown>): Promise<unknown> =>
      promise.then(
        () => 'accepted',
        (error: { name: string; $metadata?: { httpStatusCode?: number } }) => [error.name, error.$metadata?.httpStatusCode],
      );

    expect(await refusal(wrongSecret.listParts(key, uploadId))).toEqual(['SignatureDoesNotMatch', 403]);
    expect(await refusal(wrongSecret.client.send(new ListMultipartUploadsCommand({ Bucket: TEST_BUCKET })))).toEqual([
      'SignatureDoesNotMatch',
      403,
    ]);
    expect(await refusal(stranger.listParts(key, uploadId))).toEqual(['InvalidAccessKeyId', 403]);
    // abortMultipart swallows only NoSuchUpload: a refused abort surfaces.
    expect(await refusal(wrongSecret.abortMultipart(key, uploadId))).toEqual(['SignatureDoesNotMatch', 403]);
    expect(await refusal(wrongSecret.createMultipart('signed/other', 'video/mp4'))).toEqual(['SignatureDoesNotMatch', 403]);
    wrongSecret.client.destroy();
    stranger.client.destroy();

    const open = await rig.client.send(new ListMultipartUploadsCommand({ Bucket: TEST_BUCKET, Prefix: 'signed/' }));
    expect(open.Uploads?.map((upload) => upload.UploadId)).toEqual([uploadId]);
    await rig.storage.abortMultipart(key, uploadId);
  });

  it('serves ListParts through a presigned URL, and refuses it when a signed parameter is changed', async () => {
    const key = 'signed/listed';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    await putPart(await rig.storage.signPart(key, uploadId, 1, 4, 60), Buffer.from('four'));
    const url = await getSignedUrl(rig.client, new ListPartsCommand({ Bucket: TEST_BUCKET, Key: key, UploadId: uploadId, MaxParts: 5 }), {
      expiresIn: 60,
    });
    const listed = await fetch(url);
    expect(listed.status).toBe(200);
    const xml = await listed.text();
    expect(xml).toContain('<PartNumber>1</PartNumber>');
    expect(xml).toContain('<Size>4</Size>');
    const tampered = new URL(url);
    tampered.searchParams.set('max-parts', '6');
    const refused = await fetch(tampered);
    expect(refused.status).toBe(403);
    expect(errorCode(await refused.text())).toBe('SignatureDoesNotMatch');
    await rig.storage.abortMultipart(key, uploadId);
  });
});

describe('S3 fake: object responses', () => {
  it('sends X-Content-Type-Options: nosniff with GET, HEAD and Range GET of an object', async () => {
    const key = 'media/clip.mp4';
    const bytes = partBytes(9, 4096);
    await rig.storage.put(key, bytes, 'video/mp4');

    const url = await rig.storage.signGet(key, { expiresInSeconds: 60 });
    const whole = await fetch(url);
    expect(whole.status).toBe(200);
    expect(whole.headers.get('x-content-type-options')).toBe('nosniff');
    expect(whole.headers.get('content-type')).toBe('video/mp4');
    expect(Buffer.from(await whole.arrayBuffer()).equals(bytes)).toBe(true);

    const ranged = await fetch(url, { headers: { Range: 'bytes=100-199', Origin: TEST_ORIGIN } });
    expect(ranged.status).toBe(206);
    expect(ranged.headers.get('content-range')).toBe('bytes 100-199/4096');
    expect(ranged.headers.get('x-content-type-options')).toBe('nosniff');
    expect(ranged.headers.get('access-control-expose-headers')).toContain('ETag');
    expect(Buffer.from(await ranged.arrayBuffer()).equals(bytes.subarray(100, 200))).toBe(true);

    const headUrl = await getSignedUrl(rig.client, new HeadObjectCommand({ Bucket: TEST_BUCKET, Key: key }), { expiresIn: 60 });
    const head = await fetch(headUrl, { method: 'HEAD' });
    expect(head.status).toBe(200);
    expect(head.headers.get('content-length')).toBe('4096');
    expect(head.headers.get('x-content-type-options')).toBe('nosniff');
    expect((await rig.storage.head(key))?.size).toBe(4096);
  });
});

describe('S3 fake: deleting many objects of one folder at once', () => {
  it('answers DeleteObjects with 200 and removes them all (no retry to hide a failure)', async () => {
    const keys = Array.from({ length: 24 }, (_, i) => `deleted/recording/thumbnails/sheet-${i}.jpg`);
    await Promise.all(keys.map((key) => rig.storage.put(key, Buffer.from(key), 'image/jpeg')));
    const once = new S3Client({ ...clientSettings(rig), maxAttempts: 1 });
    const out = await once.send(new DeleteObjectsCommand({ Bucket: TEST_BUCKET, Delete: { Objects: keys.map((Key) => ({ Key })) } }));
    once.destroy();
    expect(out.$metadata.httpStatusCode).toBe(200);
    expect(await rig.storage.listKeys('deleted/')).toEqual([]);
  });
});
