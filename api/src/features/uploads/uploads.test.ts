import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RecordingDtoSchema, UploadDtoSchema } from '@core/contracts';
import { recordingKeys, recordingPrefix } from '@core/recordings';
import { Client, createTestApp, signedInClient, type TestApp } from '../../../test/test-app';
import { buildMember } from '../../../test/factories';
import {
  deleteSchoolObjects,
  fakeFile,
  insertStoredRecording,
  MIB,
  partBytes,
  sendParts,
  sha256,
  startUpload,
  newTeacher,
} from './uploads.test-support';

const GIB = 1024 * MIB;

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

describe('starting an upload: who may', () => {
  it('401 when signed out, 403 for a student', async () => {
    expect((await new Client(t).get('/api/uploads')).status).toBe(401);
    const student = await buildMember(t.db, { roles: ['student'] });
    const res = await (await signedInClient(t, student.email)).send('post', '/api/uploads', fakeFile(10).create);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });
});

describe('starting an upload: bad input, each with its own sentence', () => {
  const cases: [string, Record<string, unknown>, number, string, string][] = [
    ['a zero-byte file', { size: 0 }, 400, 'empty', 'This file is empty (0 bytes): choose the recording itself.'],
    ['a file over the limit', { size: 2 * GIB + 1 }, 400, 'too_large', 'The file is larger than the 2 GiB limit.'],
    ['a PDF', { type: 'application/pdf', fileName: 'worksheet.pdf' }, 400, 'not_video', 'This file is a PDF, not a video.'],
    ['a photo', { type: 'image/jpeg', fileName: 'IMG_0042.jpg' }, 400, 'not_video', 'This file is a picture (JPEG), not a video.'],
    ['a sound file', { type: 'audio/mpeg', fileName: 'tone.mp3' }, 400, 'not_video', 'This file is audio only, not a video.'],
  ];
  it.each(cases)('refuses %s', async (_name, override, status, code, message) => {
    const { person, client } = await newTeacher(t);
    const res = await client.send('post', '/api/uploads', { ...fakeFile(10).create, ...override });
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
    expect(res.body.error.message).toBe(message);
    expect(await t.db('recordings').where({ owner_id: person.id }).count({ n: '*' }).first()).toEqual({ n: 0 });
  });

  it('refuses a file with no type whose name is not a video’s', async () => {
    const { client } = await newTeacher(t);
    const res = await client.send('post', '/api/uploads', { ...fakeFile(10).create, type: '', fileName: 'notes.txt' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('not_video');
    expect(res.body.error.message).toMatch(/^This file does not look like a video: its name does not end in a video extension \(mp4, mov,/);
  });

  it('accepts a file with no type or a generic one when its name is a video’s', async () => {
    const { client } = await newTeacher(t);
    for (const [type, fileName] of [
      ['', 'clip.MOV'],
      ['application/octet-stream', 'camera 0001.mts'],
    ]) {
      const res = await client.send('post', '/api/uploads', { ...fakeFile(10).create, type, fileName });
      expect(res.status).toBe(201);
    }
  });

  it('names a malformed request field', async () => {
    const { client } = await newTeacher(t);
    const res = await client.send('post', '/api/uploads', { ...fakeFile(10).create, firstPartSha256: 'abc' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('firstPartSha256: Expected the SHA-256 of the first part, as 64 lowercase hex digits.');
  });

  it('refuses a file that would pass the quota, naming what is used and the limit', async () => {
    const { person, client } = await newTeacher(t);
    await insertStoredRecording(t, person, 19 * GIB + 512 * MIB);
    // Failed uploads whose object was deleted take no space (size_mismatch deletes the object).
    await insertStoredRecording(t, person, 5 * GIB, { state: 'failed', failure_code: 'size_mismatch' });
    const res = await client.send('post', '/api/uploads', fakeFile(10).create);
    expect(res.status).toBe(201);
    const big = await client.send('post', '/api/uploads', { ...fakeFile(10).create, size: 600 * MIB });
    expect(big.status).toBe(400);
    expect(big.body.error.code).toBe('quota_exceeded');
    expect(big.body.error.message).toBe(
      'This file (600 MiB) does not fit in your storage: you use 19.5 GiB of your 20 GiB limit, so 512 MiB is free. Delete recordings you no longer need, or ask your admin for more space.',
    );
  });
});

describe('the whole path: start, sign, PUT straight to storage, complete', () => {
  it('an 11 MiB file in two parts ends as a recording queued for processing', async () => {
    const { person, client } = await newTeacher(t);
    const file = fakeFile(11 * MIB, 'Falling magnet, take 2.mp4');
    const upload = UploadDtoSchema.parse(await startUpload(client, file.create));
    expect(upload).toMatchObject({ fileName: 'Falling magnet, take 2.mp4', size: 11 * MIB, partSize: 8 * MIB, partCount: 2 });
    expect(upload.key).toBe(recordingKeys.original(recordingPrefix(person.schoolId, upload.recordingId)));
    const recording = await t.db('recordings').where({ id: upload.recordingId }).first();
    expect(recording).toMatchObject({
      state: 'uploading',
      title: 'Falling magnet, take 2',
      original_file_name: 'Falling magnet, take 2.mp4',
    });

    const open = await client.get('/api/uploads');
    expect(open.body.uploads).toEqual([expect.objectContaining({ id: upload.id, uploadedParts: 0, uploadedBytes: 0 })]);
    expect(open.body.limits).toMatchObject({ maxBytes: 2 * GIB, quotaBytes: 20 * GIB, usedBytes: 11 * MIB });
    expect(open.body.limits.accept).toContain('video/*');

    const signed = await client.send('post', `/api/uploads/${upload.id}/parts/2`);
    expect(signed.body.contentLength).toBe(3 * MIB);
    const parts = await sendParts(client, upload, file.bytes, [1, 2]);
    const listed = await client.get(`/api/uploads/${upload.id}/parts`);
    expect(listed.body.parts.map((p: { partNumber: number; size: number }) => [p.partNumber, p.size])).toEqual([
      [1, 8 * MIB],
      [2, 3 * MIB],
    ]);

    const done = await client.send('post', `/api/uploads/${upload.id}/complete`, { parts });
    expect(done.status).toBe(200);
    const dto = RecordingDtoSchema.parse(done.body);
    expect(dto).toMatchObject({ id: upload.recordingId, state: 'processing', sizeBytes: 11 * MIB, uploadId: null, canEdit: true });
    expect(t.enqueued).toContain(upload.recordingId);
    expect(await t.storage.head(upload.key)).toMatchObject({ size: 11 * MIB });
    expect(sha256(Buffer.concat([partBytes(file.bytes, upload, 1), partBytes(file.bytes, upload, 2)]))).toBe(sha256(file.bytes));
    expect(await t.db('uploads').where({ id: upload.id }).first('status')).toEqual({ status: 'completed' });

    // Completing again (a retried request) answers the same and queues nothing new.
    const enqueuedBefore = t.enqueued.length;
    const again = await client.send('post', `/api/uploads/${upload.id}/complete`, { parts });
    expect(again.status).toBe(200);
    expect(again.body.id).toBe(upload.recordingId);
    expect(t.enqueued.length).toBe(enqueuedBefore);
    expect((await client.get('/api/uploads')).body.uploads).toEqual([]);
    const late = await client.send('post', `/api/uploads/${upload.id}/parts/1`);
    expect(late.status).toBe(409);
    expect(late.body.error).toEqual({
      code: 'upload_finished',
      message: 'This upload is already finished: the recording is in the library.',
    });
  });
});

describe('signing parts', () => {
  it('refuses a part number beyond the upload’s part count, and part 0', async () => {
    const { client } = await newTeacher(t);
    const upload = await startUpload(client, fakeFile(11 * MIB).create);
    const beyond = await client.send('post', `/api/uploads/${upload.id}/parts/3`);
    expect(beyond.status).toBe(400);
    expect(beyond.body.error.message).toBe('This upload has 2 parts: there is no part 3.');
    const zero = await client.send('post', `/api/uploads/${upload.id}/parts/0`);
    expect(zero.status).toBe(400);
    expect(zero.body.error.details[0].path).toBe('partNumber');
  });

  it('a part URL is good for an hour and refuses a body of another length', async () => {
    const { client } = await newTeacher(t);
    const file = fakeFile(11 * MIB);
    const upload = await startUpload(client, file.create);
    const before = Date.now();
    const signed = await client.send('post', `/api/uploads/${upload.id}/parts/2`);
    const lifetime = new Date(signed.body.expiresAt).getTime() - before;
    expect(lifetime).toBeGreaterThan(59 * 60_000);
    expect(lifetime).toBeLessThanOrEqual(61 * 60_000);
    // Content-Length is a signed header of the URL, so S3 refuses any other length (SigV4: AWS S3 API reference, "Authenticating Requests: Using Query Parameters").
    const longer = await fetch(signed.body.url, { method: 'PUT', body: Buffer.alloc(3 * MIB + 1) });
    expect(longer.status).toBe(403);
    const shorter = await fetch(signed.body.url, { method: 'PUT', body: Buffer.alloc(1 * MIB) });
    expect(shorter.status).toBe(403);
    const exact = await fetch(signed.body.url, { method: 'PUT', body: partBytes(file.bytes, upload, 2) });
    expect(exact.status).toBe(200);
  });
});

describe('when storage is down', () => {
  it('answers 503 and leaves no rows behind', async () => {
    const down = await createTestApp({ S3_ENDPOINT: 'http://127.0.0.1:9' });
    try {
      const person = await buildMember(down.db, { roles: ['teacher'] });
      const client = await signedInClient(down, person.email);
      const res = await client.send('post', '/api/uploads', fakeFile(10).create);
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('storage_unavailable');
      expect(await down.db('recordings').count({ n: '*' }).first()).toEqual({ n: 0 });
      expect(await down.db('uploads').count({ n: '*' }).first()).toEqual({ n: 0 });
    } finally {
      await down.close();
    }
  });
});
