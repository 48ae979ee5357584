import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects, fakeFile, MIB, sendParts, sha256, startUpload, newTeacher } from './uploads.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

describe('resuming after a reload', () => {
  it('lists the stored parts, matches the re-chosen file, and sends only the missing part', async () => {
    const { person, client } = await newTeacher(t);
    const file = fakeFile(11 * MIB, 'Eddy currents – Jörg’s tube.mov', 'video/quicktime');
    const upload = await startUpload(client, file.create);
    const [first] = await sendParts(client, upload, file.bytes, [1]);

    // The page reloads: a new session of the same teacher, the file chosen again from disk.
    const reloaded = new Client(t);
    await reloaded.signIn(person.email);
    const open = await reloaded.get('/api/uploads');
    expect(open.body.uploads).toEqual([
      expect.objectContaining({ id: upload.id, fileName: 'Eddy currents – Jörg’s tube.mov', uploadedParts: 1, uploadedBytes: 8 * MIB }),
    ]);
    const resumed = await reloaded.send('post', `/api/uploads/${upload.id}/resume`, file.facts);
    expect(resumed.status).toBe(200);
    expect(resumed.body).toMatchObject({ id: upload.id, key: upload.key, partCount: 2 });
    const stored = await reloaded.get(`/api/uploads/${upload.id}/parts`);
    expect(stored.body.parts).toEqual([{ partNumber: 1, size: 8 * MIB, etag: first!.etag }]);

    // Only part 2 goes over the wire now; the stored part 1 is joined as it is.
    const [second] = await sendParts(reloaded, upload, file.bytes, [2]);
    const done = await reloaded.send('post', `/api/uploads/${upload.id}/complete`, { parts: [first, second] });
    expect(done.status).toBe(200);
    expect(done.body.state).toBe('processing');
    const tmp = `/tmp/hupl-resume-${upload.id}`;
    await t.storage.download(upload.key, tmp);
    const { readFile, rm } = await import('node:fs/promises');
    expect(sha256(await readFile(tmp))).toBe(sha256(file.bytes));
    await rm(tmp);
  });

  it('refuses a different file, naming what differs', async () => {
    const { client } = await newTeacher(t);
    const file = fakeFile(11 * MIB, 'Pendulum.mp4');
    const upload = await startUpload(client, file.create);
    const resume = (change: Record<string, unknown>) =>
      client.send('post', `/api/uploads/${upload.id}/resume`, { ...file.facts, ...change });

    const bigger = await resume({ size: 14 * MIB });
    expect(bigger.status).toBe(409);
    expect(bigger.body.error.code).toBe('file_mismatch');
    expect(bigger.body.error.message).toBe('This is not the same file: it is 14 MiB, the unfinished upload is 11 MiB.');

    const renamed = await resume({ fileName: 'Pendulum (1).mp4' });
    expect(renamed.body.error.message).toBe(
      'This is not the same file: it is called “Pendulum (1).mp4”, the unfinished upload is “Pendulum.mp4”.',
    );

    const edited = await resume({ lastModified: file.facts.lastModified + 60_000 });
    expect(edited.body.error.message).toBe(
      'This is not the same file: it was last changed 2025-11-24 16:01:00 UTC, the unfinished upload’s file 2025-11-24 16:00:00 UTC.',
    );

    const other = await resume({ firstPartSha256: 'f'.repeat(64) });
    expect(other.body.error.message).toBe('This is not the same file: its first part has different contents from the unfinished upload’s.');

    const everything = await resume({ size: 1, fileName: 'x.mp4', firstPartSha256: '0'.repeat(64) });
    expect(everything.body.error.details.map((d: { path: string }) => d.path)).toEqual(['size', 'fileName', 'firstPartSha256']);
  });

  it('tells two sizes that read alike apart in bytes', async () => {
    const { client } = await newTeacher(t);
    const file = fakeFile(11 * MIB);
    const upload = await startUpload(client, file.create);
    const res = await client.send('post', `/api/uploads/${upload.id}/resume`, { ...file.facts, size: 11 * MIB + 1 });
    expect(res.body.error.message).toBe('This is not the same file: it is 11,534,337 bytes, the unfinished upload is 11,534,336 bytes.');
  });
});

describe('completing with parts missing or wrong', () => {
  it('says which parts are not stored yet, and which do not match', async () => {
    const { client } = await newTeacher(t);
    const file = fakeFile(11 * MIB);
    const upload = await startUpload(client, file.create);
    const [first] = await sendParts(client, upload, file.bytes, [1]);

    const missing = await client.send('post', `/api/uploads/${upload.id}/complete`, { parts: [first] });
    expect(missing.status).toBe(400);
    expect(missing.body.error).toEqual({
      code: 'parts_missing',
      message: 'Part 2 of 2 is not stored yet: send it, then finish the upload.',
      details: [{ path: 'parts', message: 'Part 2 is not stored.' }],
    });

    const [second] = await sendParts(client, upload, file.bytes, [2]);
    const wrong = await client.send('post', `/api/uploads/${upload.id}/complete`, {
      parts: [first, { partNumber: 2, etag: '"0123456789abcdef0123456789abcdef"' }],
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.code).toBe('parts_mismatch');
    expect(wrong.body.error.message).toBe('Part 2 of 2 does not match what storage holds: send it again, then finish the upload.');

    const extra = await client.send('post', `/api/uploads/${upload.id}/complete`, { parts: [first, second, { partNumber: 3, etag: 'x' }] });
    expect(extra.body.error.message).toBe('This upload has 2 parts: part 3 does not belong to it.');
    expect(await t.storage.head(upload.key)).toBeNull();
    expect(await t.db('recordings').where({ id: upload.recordingId }).first('state')).toEqual({ state: 'uploading' });
  });
});

describe('cancelling an upload', () => {
  it('aborts it in storage, marks it aborted and deletes its recording row', async () => {
    const { client } = await newTeacher(t);
    const file = fakeFile(11 * MIB);
    const upload = await startUpload(client, file.create);
    await sendParts(client, upload, file.bytes, [1]);
    const s3UploadId = (await t.db('uploads').where({ id: upload.id }).first('s3_upload_id')).s3_upload_id;

    const res = await client.send('delete', `/api/uploads/${upload.id}`);
    expect(res.status).toBe(204);
    expect(await t.db('uploads').where({ id: upload.id }).first('status')).toEqual({ status: 'aborted' });
    expect(await t.db('recordings').where({ id: upload.recordingId }).first()).toBeUndefined();
    await expect(t.storage.listParts(upload.key, s3UploadId)).rejects.toMatchObject({ name: 'NoSuchUpload' });
    expect((await client.get('/api/uploads')).body.uploads).toEqual([]);

    const sign = await client.send('post', `/api/uploads/${upload.id}/parts/2`);
    expect(sign.status).toBe(409);
    expect(sign.body.error.message).toBe('This upload was cancelled: start it again to send the file.');
    expect((await client.send('delete', `/api/uploads/${upload.id}`)).status).toBe(204);
  });
});
