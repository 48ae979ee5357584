import { request } from 'node:http';
import {
  AbortMultipartUploadCommand,
  CompleteMultipartUploadCommand,
  GetObjectCommand,
  ListMultipartUploadsCommand,
  ListPartsCommand,
} from '@aws-sdk/client-s3';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

// Real files and sockets on a shared 2-core machine: a generous ceiling, no timing is asserted.
vi.setConfig({ testTimeout: 30_000, hookTimeout: 30_000 });
import type { S3TestRig } from './s3-test-fixture';
import { MIB, TEST_BUCKET, errorCode, md5Hex, partBytes, putPart, startS3Rig } from './s3-test-fixture';

// Part sizes: S3 needs at least 5 MiB for every part but the last (https://docs.aws.amazon.com/AmazonS3/latest/userguide/qfacts.html).
const PART = 5 * MIB;
const LAST = 123_457;
let rig: S3TestRig;

beforeAll(async () => {
  rig = await startS3Rig();
});

afterAll(async () => {
  await rig?.close();
});

/** Sends one part through a URL from the API's signPart, as the browser does, and returns its ETag. */
async function sendPart(key: string, uploadId: string, partNumber: number, body: Buffer): Promise<string> {
  const url = await rig.storage.signPart(key, uploadId, partNumber, body.length, 300);
  const response = await putPart(url, body);
  expect(response.status, await response.clone().text()).toBe(200);
  return response.headers.get('etag') ?? '';
}

async function s3ErrorOf(promise: Promise<unknown>): Promise<{ name: string; status: number | undefined }> {
  const error = (await promise.then(
    () => {
      throw new Error('expected S3 to refuse the call');
    },
    (e: unknown) => e,
  )) as { name: string; $metadata?: { httpStatusCode?: number } };
  return { name: error.name, status: error.$metadata?.httpStatusCode };
}

describe('S3 fake: resumable multipart upload, through the API storage module', () => {
  it('stores presigned parts, lists them, completes, and serves the whole object with HEAD and Range GET', async () => {
    const key = 'schools/s1/recordings/r1/original';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    expect(uploadId).toMatch(/^[0-9a-f]{32}$/);
    const bodies = [partBytes(1, PART), partBytes(2, PART), partBytes(3, LAST)];

    const etags: string[] = [];
    for (const [index, body] of bodies.entries()) etags.push(await sendPart(key, uploadId, index + 1, body));
    expect(etags).toEqual(bodies.map((body) => `"${md5Hex(body)}"`));

    // Resuming: ListParts says what is stored, with quoted ETags and exact sizes.
    expect(await rig.storage.listParts(key, uploadId)).toEqual([
      { partNumber: 1, size: PART, etag: etags[0] },
      { partNumber: 2, size: PART, etag: etags[1] },
      { partNumber: 3, size: LAST, etag: etags[2] },
    ]);
    const raw = await rig.client.send(new ListPartsCommand({ Bucket: TEST_BUCKET, Key: key, UploadId: uploadId }));
    expect(raw.Parts?.every((part) => part.LastModified instanceof Date && !Number.isNaN(part.LastModified.getTime()))).toBe(true);
    expect(raw.IsTruncated).toBe(false);

    await rig.storage.completeMultipart(
      key,
      uploadId,
      etags.map((etag, index) => ({ partNumber: index + 1, etag })),
    );
    expect(await rig.storage.head(key)).toEqual({ size: 2 * PART + LAST, contentType: 'video/mp4' });

    // Across the boundary of parts 1 and 2: bytes in the order they were sent.
    const range = await rig.client.send(new GetObjectCommand({ Bucket: TEST_BUCKET, Key: key, Range: `bytes=${PART - 2}-${PART + 1}` }));
    expect(range.$metadata.httpStatusCode).toBe(206);
    expect(range.ContentRange).toBe(`bytes ${PART - 2}-${PART + 1}/${2 * PART + LAST}`);
    const expected = Buffer.concat([bodies[0]!.subarray(PART - 2), bodies[1]!.subarray(0, 2)]);
    expect(Buffer.from(await range.Body!.transformToByteArray()).equals(expected)).toBe(true);

    // A multipart object's ETag is not the MD5 of its bytes (https://docs.aws.amazon.com/AmazonS3/latest/API/API_Object.html).
    const whole = await fetch(await rig.storage.signGet(key, { expiresInSeconds: 60 }));
    const bytes = Buffer.from(await whole.arrayBuffer());
    expect(bytes.equals(Buffer.concat(bodies))).toBe(true);
    expect(whole.headers.get('etag')).toMatch(/^"[0-9a-f]{32}-3"$/);
    expect(whole.headers.get('etag')).not.toBe(`"${md5Hex(bytes)}"`);

    // Completing forgets the upload.
    expect((await s3ErrorOf(rig.storage.listParts(key, uploadId))).name).toBe('NoSuchUpload');
    const open = await rig.client.send(new ListMultipartUploadsCommand({ Bucket: TEST_BUCKET, Prefix: key }));
    expect(open.Uploads ?? []).toEqual([]);
  });

  it('pages ListParts with max-parts and part-number-marker, and never answers more than 1,000 parts', async () => {
    const key = 'paging/parts';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    // Tiny parts are fine until completion.
    await Promise.all([1, 2, 3, 4, 5].map((n) => sendPart(key, uploadId, n, Buffer.from(`part ${n}`))));

    const first = await rig.client.send(new ListPartsCommand({ Bucket: TEST_BUCKET, Key: key, UploadId: uploadId, MaxParts: 2 }));
    expect(first.Parts?.map((part) => part.PartNumber)).toEqual([1, 2]);
    expect(first.IsTruncated).toBe(true);
    expect(first.NextPartNumberMarker).toBe('2');
    const second = await rig.client.send(
      new ListPartsCommand({
        Bucket: TEST_BUCKET,
        Key: key,
        UploadId: uploadId,
        MaxParts: 2,
        PartNumberMarker: first.NextPartNumberMarker,
      }),
    );
    expect(second.Parts?.map((part) => part.PartNumber)).toEqual([3, 4]);
    const last = await rig.client.send(
      new ListPartsCommand({
        Bucket: TEST_BUCKET,
        Key: key,
        UploadId: uploadId,
        MaxParts: 2,
        PartNumberMarker: second.NextPartNumberMarker,
      }),
    );
    expect(last.Parts?.map((part) => part.PartNumber)).toEqual([5]);
    expect(last.IsTruncated).toBe(false);
    // S3 caps a page at 1,000 parts whatever max-parts asks (https://docs.aws.amazon.com/AmazonS3/latest/API/API_ListParts.html).
    const capped = await rig.client.send(new ListPartsCommand({ Bucket: TEST_BUCKET, Key: key, UploadId: uploadId, MaxParts: 5000 }));
    expect(capped.MaxParts).toBe(1000);
    expect(capped.Parts).toHaveLength(5);
    await rig.storage.abortMultipart(key, uploadId);
  });

  it('makes the module follow the pages when the store answers fewer parts than it asked for', async () => {
    // The module asks for 1,000 a page; a fake that pages at 3 stands in for an upload of over 1,000 parts.
    const paged = await startS3Rig({ listPageLimit: 3 });
    try {
      const key = 'paging/module';
      const uploadId = await paged.storage.createMultipart(key, 'video/mp4');
      for (const n of [1, 2, 3, 4, 5, 6, 7]) {
        const body = Buffer.from(`part ${n}`);
        expect((await putPart(await paged.storage.signPart(key, uploadId, n, body.length, 60), body)).status).toBe(200);
      }
      const page = await paged.client.send(new ListPartsCommand({ Bucket: TEST_BUCKET, Key: key, UploadId: uploadId }));
      expect([page.Parts?.length, page.IsTruncated, page.NextPartNumberMarker]).toEqual([3, true, '3']);
      const all = await paged.storage.listParts(key, uploadId);
      expect(all.map((part) => part.partNumber)).toEqual([1, 2, 3, 4, 5, 6, 7]);
      expect(all[6]).toEqual({ partNumber: 7, size: 6, etag: `"${md5Hex(Buffer.from('part 7'))}"` });
    } finally {
      await paged.close();
    }
  });

  it('aborts: the parts are removed and every later call on the upload is NoSuchUpload', async () => {
    const key = 'aborted/clip';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    await sendPart(key, uploadId, 1, partBytes(1, 1000));
    const aborted = await rig.client.send(new AbortMultipartUploadCommand({ Bucket: TEST_BUCKET, Key: key, UploadId: uploadId }));
    expect(aborted.$metadata.httpStatusCode).toBe(204);

    const late = await putPart(await rig.storage.signPart(key, uploadId, 2, 10, 60), Buffer.alloc(10));
    expect(late.status).toBe(404);
    expect(errorCode(await late.text())).toBe('NoSuchUpload');
    expect(await s3ErrorOf(rig.storage.listParts(key, uploadId))).toEqual({ name: 'NoSuchUpload', status: 404 });
    expect(await s3ErrorOf(rig.storage.completeMultipart(key, uploadId, [{ partNumber: 1, etag: '"x"' }]))).toEqual({
      name: 'NoSuchUpload',
      status: 404,
    });
    expect(
      await s3ErrorOf(rig.client.send(new AbortMultipartUploadCommand({ Bucket: TEST_BUCKET, Key: key, UploadId: uploadId }))),
    ).toEqual({
      name: 'NoSuchUpload',
      status: 404,
    });
    // The module treats an upload that is already gone as aborted.
    await expect(rig.storage.abortMultipart(key, uploadId)).resolves.toBeUndefined();
    expect(await rig.storage.head(key)).toBeNull();
  });

  it('answers NoSuchUpload for a made-up id, or a real id used with another key', async () => {
    const uploadId = await rig.storage.createMultipart('owner/one', 'video/mp4');
    for (const [key, id] of [
      ['owner/one', '0123456789abcdef0123456789abcdef'],
      ['owner/one', '../../../etc'],
      ['owner/two', uploadId],
    ] as const) {
      expect(await s3ErrorOf(rig.storage.listParts(key, id))).toEqual({ name: 'NoSuchUpload', status: 404 });
      const response = await putPart(await rig.storage.signPart(key, id, 1, 4, 60), Buffer.from('abcd'));
      expect(response.status).toBe(404);
      expect(errorCode(await response.text())).toBe('NoSuchUpload');
    }
    expect(await rig.storage.listParts('owner/one', uploadId)).toEqual([]);
    await rig.storage.abortMultipart('owner/one', uploadId);
  });

  it('lists open uploads by prefix, pages them, and keeps them across a restart', async () => {
    const ids = {
      a1: await rig.storage.createMultipart('list/a/one', 'video/mp4'),
      a2: await rig.storage.createMultipart('list/a/two', 'video/mp4'),
      b1: await rig.storage.createMultipart('list/b/one', 'video/webm'),
    };
    await sendPart('list/a/two', ids.a2, 1, Buffer.from('kept'));
    const underA = await rig.client.send(new ListMultipartUploadsCommand({ Bucket: TEST_BUCKET, Prefix: 'list/a/' }));
    expect(underA.Uploads?.map((upload) => [upload.Key, upload.UploadId])).toEqual([
      ['list/a/one', ids.a1],
      ['list/a/two', ids.a2],
    ]);
    expect(underA.Uploads?.every((upload) => upload.Initiated instanceof Date && !Number.isNaN(upload.Initiated.getTime()))).toBe(true);

    const page1 = await rig.client.send(new ListMultipartUploadsCommand({ Bucket: TEST_BUCKET, Prefix: 'list/', MaxUploads: 2 }));
    expect(page1.Uploads?.map((upload) => upload.Key)).toEqual(['list/a/one', 'list/a/two']);
    expect(page1.IsTruncated).toBe(true);
    const page2 = await rig.client.send(
      new ListMultipartUploadsCommand({
        Bucket: TEST_BUCKET,
        Prefix: 'list/',
        MaxUploads: 2,
        KeyMarker: page1.NextKeyMarker,
        UploadIdMarker: page1.NextUploadIdMarker,
      }),
    );
    expect(page2.Uploads?.map((upload) => upload.UploadId)).toEqual([ids.b1]);
    expect(page2.IsTruncated).toBe(false);
    const folders = await rig.client.send(new ListMultipartUploadsCommand({ Bucket: TEST_BUCKET, Prefix: 'list/', Delimiter: '/' }));
    expect(folders.CommonPrefixes?.map((prefix) => prefix.Prefix)).toEqual(['list/a/', 'list/b/']);

    await rig.restart();
    const after = await rig.client.send(new ListMultipartUploadsCommand({ Bucket: TEST_BUCKET, Prefix: 'list/' }));
    expect(after.Uploads?.map((upload) => upload.UploadId)).toEqual([ids.a1, ids.a2, ids.b1]);
    expect((await rig.storage.listParts('list/a/two', ids.a2)).map((part) => part.size)).toEqual([4]);

    await rig.storage.abortMultipart('list/a/one', ids.a1);
    const left = await rig.client.send(new ListMultipartUploadsCommand({ Bucket: TEST_BUCKET, Prefix: 'list/' }));
    expect(left.Uploads?.map((upload) => upload.Key)).toEqual(['list/a/two', 'list/b/one']);
    await rig.storage.abortMultipart('list/a/two', ids.a2);
    await rig.storage.abortMultipart('list/b/one', ids.b1);
  });

  it('refuses a completion S3 would refuse, and keeps the upload for a corrected one', async () => {
    const key = 'checked/clip';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    const small = [await sendPart(key, uploadId, 1, partBytes(1, 1000)), await sendPart(key, uploadId, 2, partBytes(2, 1000))];
    const complete = (parts: { partNumber: number; etag: string }[]): Promise<unknown> =>
      rig.client.send(
        new CompleteMultipartUploadCommand({
          Bucket: TEST_BUCKET,
          Key: key,
          UploadId: uploadId,
          MultipartUpload: { Parts: parts.map((part) => ({ PartNumber: part.partNumber, ETag: part.etag })) },
        }),
      );
    expect(
      await s3ErrorOf(
        complete([
          { partNumber: 1, etag: small[0]! },
          { partNumber: 2, etag: small[1]! },
        ]),
      ),
    ).toEqual({
      name: 'EntityTooSmall',
      status: 400,
    });
    expect(await s3ErrorOf(complete([{ partNumber: 1, etag: small[1]! }]))).toEqual({ name: 'InvalidPart', status: 400 });
    expect(await s3ErrorOf(complete([{ partNumber: 3, etag: small[0]! }]))).toEqual({ name: 'InvalidPart', status: 400 });
    expect(
      await s3ErrorOf(
        complete([
          { partNumber: 2, etag: small[1]! },
          { partNumber: 1, etag: small[0]! },
        ]),
      ),
    ).toEqual({
      name: 'InvalidPartOrder',
      status: 400,
    });
    expect(await rig.storage.head(key)).toBeNull();

    const big = await sendPart(key, uploadId, 1, partBytes(1, PART));
    await rig.storage.completeMultipart(key, uploadId, [
      { partNumber: 1, etag: big },
      { partNumber: 2, etag: small[1]! },
    ]);
    expect((await rig.storage.head(key))?.size).toBe(PART + 1000);
    expect(await rig.storage.deletePrefix('checked/')).toBe(1);
    expect(await rig.storage.head(key)).toBeNull();
  });

  it('keeps the stored part when a re-send of it is cut off midway (no short part is ever listed)', async () => {
    const key = 'interrupted/clip';
    const uploadId = await rig.storage.createMultipart(key, 'video/mp4');
    const first = await sendPart(key, uploadId, 1, partBytes(1, PART));
    const cutOff = (): Promise<void> =>
      rig.storage.signPart(key, uploadId, 1, PART, 60).then(
        (url) =>
          new Promise<void>((resolve) => {
            const req = request(new URL(url), { method: 'PUT', headers: { 'content-length': String(PART) } });
            req.on('error', () => resolve());
            req.write(partBytes(7, MIB), () => {
              req.destroy();
              resolve();
            });
          }),
      );
    await cutOff();
    // S3 keeps the last whole part under a number until another whole one replaces it.
    expect(await rig.storage.listParts(key, uploadId)).toEqual([{ partNumber: 1, size: PART, etag: first }]);
    const second = await cutOff().then(() => sendPart(key, uploadId, 2, partBytes(2, 10)));
    expect(await rig.storage.listParts(key, uploadId)).toEqual([
      { partNumber: 1, size: PART, etag: first },
      { partNumber: 2, size: 10, etag: second },
    ]);
    await rig.storage.abortMultipart(key, uploadId);
  });
});
