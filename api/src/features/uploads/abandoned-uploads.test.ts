import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, signedInClient, type TestApp } from '../../../test/test-app';
import { buildMember } from '../../../test/factories';
import { createObjectStorage, storageConfigFromEnv } from '../../storage/object-storage';
import { loadEnv } from '../../env';
import { abortAbandonedUploads } from './abandoned-uploads';
import { deleteSchoolObjects, fakeFile, MIB, sendParts, startUpload } from './uploads.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

async function idleFor(uploadId: string, hours: number) {
  await t
    .db('uploads')
    .where({ id: uploadId })
    .update({ last_activity_at: t.db.raw(`now() - make_interval(hours => ?)`, [hours]) });
}

describe('cleaning up abandoned uploads', () => {
  it('aborts uploads idle longer than the limit and deletes their recording rows, leaving the rest', async () => {
    const person = await buildMember(t.db, { roles: ['teacher'] });
    const client = await signedInClient(t, person.email);
    const file = fakeFile(11 * MIB);
    const stale = await startUpload(client, file.create);
    await sendParts(client, stale, file.bytes, [1]);
    const recent = await startUpload(client, fakeFile(11 * MIB).create);
    // A finished upload is never touched, however old.
    const small = fakeFile(10);
    const done = await startUpload(client, small.create);
    const doneParts = await sendParts(client, done, small.bytes, [1]);
    expect((await client.send('post', `/api/uploads/${done.id}/complete`, { parts: doneParts })).status).toBe(200);

    await idleFor(stale.id, 49);
    await idleFor(recent.id, 47);
    await idleFor(done.id, 100);
    const staleS3Id = (await t.db('uploads').where({ id: stale.id }).first('s3_upload_id')).s3_upload_id;

    expect(await abortAbandonedUploads({ db: t.db, storage: t.storage, olderThanHours: 48 })).toBe(1);

    expect(await t.db('uploads').where({ id: stale.id }).first('status')).toEqual({ status: 'aborted' });
    expect(await t.db('recordings').where({ id: stale.recordingId }).first()).toBeUndefined();
    await expect(t.storage.listParts(stale.key, staleS3Id)).rejects.toMatchObject({ name: 'NoSuchUpload' });

    expect(await t.db('uploads').where({ id: recent.id }).first('status')).toEqual({ status: 'uploading' });
    expect(await t.db('recordings').where({ id: recent.recordingId }).first('state')).toEqual({ state: 'uploading' });
    expect(await t.db('uploads').where({ id: done.id }).first('status')).toEqual({ status: 'completed' });
    expect(await t.db('recordings').where({ id: done.recordingId }).first('state')).toEqual({ state: 'processing' });

    // Nothing left to do on a second run.
    expect(await abortAbandonedUploads({ db: t.db, storage: t.storage, olderThanHours: 48 })).toBe(0);
  });

  it('when storage is down, changes nothing and throws for the job to retry', async () => {
    const person = await buildMember(t.db, { roles: ['teacher'] });
    const client = await signedInClient(t, person.email);
    const upload = await startUpload(client, fakeFile(10).create);
    await idleFor(upload.id, 72);
    const down = createObjectStorage(storageConfigFromEnv(loadEnv({ S3_ENDPOINT: 'http://127.0.0.1:9' })));
    await expect(abortAbandonedUploads({ db: t.db, storage: down, olderThanHours: 48 })).rejects.toThrow(
      /abandoned upload\(s\) could not be aborted \(0 were\)/,
    );
    expect(await t.db('uploads').where({ id: upload.id }).first('status')).toEqual({ status: 'uploading' });
    expect(await t.db('recordings').where({ id: upload.recordingId }).first('state')).toEqual({ state: 'uploading' });
  });
});
