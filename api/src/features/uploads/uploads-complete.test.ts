import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UploadPartCommand } from '@aws-sdk/client-s3';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects, fakeFile, insertStoredRecording, MIB, sendParts, startUpload, newTeacher } from './uploads.test-support';

const GIB = 1024 * MIB;

let t: TestApp;
beforeAll(async () => {
  // The smallest quota the settings allow, so a test can fill it with one row.
  t = await createTestApp({ UPLOAD_QUOTA_BYTES: String(2 * GIB) });
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

describe('checking the stored object on completion', () => {
  it('a stored size other than the declared one deletes the object and leaves the recording failed', async () => {
    const { client } = await newTeacher(t);
    const file = fakeFile(11 * MIB);
    const upload = await startUpload(client, file.create);
    const [first] = await sendParts(client, upload, file.bytes, [1]);
    // A client that went around the signed URLs: part 2 sent with 1 MiB instead of 3.
    const s3UploadId = (await t.db('uploads').where({ id: upload.id }).first('s3_upload_id')).s3_upload_id;
    const sneaked = await t.storage.client.send(
      new UploadPartCommand({ Bucket: t.storage.bucket, Key: upload.key, UploadId: s3UploadId, PartNumber: 2, Body: Buffer.alloc(MIB) }),
    );
    const parts = [first!, { partNumber: 2, etag: sneaked.ETag! }];

    const res = await client.send('post', `/api/uploads/${upload.id}/complete`, { parts });
    expect(res.status).toBe(400);
    const message =
      'The stored file is 9 MiB but the upload said 11 MiB: the file changed or was cut short while uploading. Upload it again.';
    expect(res.body.error).toEqual({ code: 'size_mismatch', message });
    expect(await t.storage.head(upload.key)).toBeNull();
    expect(await t.db('recordings').where({ id: upload.recordingId }).first('state', 'failure_code', 'failure_message')).toEqual({
      state: 'failed',
      failure_code: 'size_mismatch',
      failure_message: message,
    });
    expect(t.enqueued).not.toContain(upload.recordingId);

    // The library shows it as failed; completing again gives the same answer and redoes nothing.
    const again = await client.send('post', `/api/uploads/${upload.id}/complete`, { parts });
    expect(again.status).toBe(400);
    expect(again.body.error).toEqual({ code: 'size_mismatch', message });
  });

  it('a file that no longer fits the quota when it completes is deleted, the recording failed', async () => {
    const { person, client } = await newTeacher(t);
    const file = fakeFile(11 * MIB);
    const upload = await startUpload(client, file.create);
    const parts = await sendParts(client, upload, file.bytes, [1, 2]);
    // Meanwhile another of the teacher's uploads finished and took almost all the space.
    await insertStoredRecording(t, person, 2 * GIB - 5 * MIB);

    const res = await client.send('post', `/api/uploads/${upload.id}/complete`, { parts });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('quota_exceeded');
    expect(res.body.error.message).toBe(
      'This file (11 MiB) does not fit in your storage: you use 2 GiB of your 2 GiB limit, so 5 MiB is free. Delete recordings you no longer need, or ask your admin for more space.',
    );
    expect(await t.storage.head(upload.key)).toBeNull();
    expect(await t.db('recordings').where({ id: upload.recordingId }).first('state', 'failure_code')).toEqual({
      state: 'failed',
      failure_code: 'quota_exceeded',
    });
    expect(t.enqueued).not.toContain(upload.recordingId);
  });
});
