import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAILURE_CODES } from '@core/contracts';
import { createTestApp, signedInClient, type TestApp } from '../../../test/test-app';
import { buildMember, buildSchool } from '../../../test/factories';
import { insertOpenUpload, insertReadyRecording, insertRecording } from './test-recordings';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function member(roles: ('teacher' | 'admin')[], schoolId?: string) {
  const person = await buildMember(t.db, { roles, schoolId });
  return { ...person, client: await signedInClient(t, person.email) };
}

describe('DELETE /api/recordings/:recordingId', () => {
  it('403 for a colleague; the owner deletes every object under the prefix, the row and its captions', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    const colleague = await member(['teacher'], school.id);
    const rec = await insertReadyRecording(t.db, t.storage, { schoolId: school.id, ownerId: owner.id, tiles: [4, 1] });
    await t
      .db('recording_captions')
      .insert({ recording_id: rec.id, language: 'en', label: 'English', is_default: true, vtt: 'WEBVTT\n', cue_count: 0 });
    expect(await t.storage.listKeys(rec.prefix)).toHaveLength(5);

    expect((await colleague.client.send('delete', `/api/recordings/${rec.id}`)).status).toBe(403);
    expect(await t.storage.listKeys(rec.prefix)).toHaveLength(5);

    const res = await owner.client.send('delete', `/api/recordings/${rec.id}`);
    expect(res.status).toBe(204);
    expect(await t.storage.listKeys(rec.prefix)).toEqual([]);
    expect(await t.db('recordings').where({ id: rec.id }).first()).toBeUndefined();
    expect(await t.db('recording_captions').where({ recording_id: rec.id }).first()).toBeUndefined();
    expect((await owner.client.get(`/api/recordings/${rec.id}`)).status).toBe(404);
  });

  it('an admin of the school deletes a colleague’s recording', async () => {
    const school = await buildSchool(t.db);
    const owner = await buildMember(t.db, { roles: ['teacher'], schoolId: school.id });
    const admin = await member(['admin'], school.id);
    const rec = await insertReadyRecording(t.db, t.storage, { schoolId: school.id, ownerId: owner.id });
    expect((await admin.client.send('delete', `/api/recordings/${rec.id}`)).status).toBe(204);
    expect(await t.storage.listKeys(rec.prefix)).toEqual([]);
  });

  it('aborts the multipart upload of a recording still uploading and marks the upload aborted', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    const rec = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id, state: 'uploading' });
    const s3UploadId = await t.storage.createMultipart(rec.keys.original, 'video/mp4');
    const uploadId = await insertOpenUpload(t.db, rec, owner, s3UploadId);
    const res = await owner.client.send('delete', `/api/recordings/${rec.id}`);
    expect(res.status).toBe(204);
    expect(await t.db('uploads').where({ id: uploadId }).first('status', 'recording_id')).toEqual({
      status: 'aborted',
      recording_id: null,
    });
    expect(await t.db('recordings').where({ id: rec.id }).first()).toBeUndefined();
    expect(await t.storage.listKeys(rec.prefix)).toEqual([]);
    // The upload is gone from storage too: its parts can no longer be listed.
    await expect(t.storage.listParts(rec.keys.original, s3UploadId)).rejects.toThrow();
  });
});

describe('POST /api/recordings/:recordingId/retry', () => {
  it('puts a retryable failure back into processing and queues it', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    const rec = await insertRecording(t.db, {
      schoolId: school.id,
      ownerId: owner.id,
      state: 'failed',
      failureCode: 'timed_out',
      progress: 63,
    });
    const res = await owner.client.send('post', `/api/recordings/${rec.id}/retry`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: rec.id, state: 'processing', progress: 0, failure: null });
    expect(t.enqueued).toContain(rec.id);
    expect(await t.db('recordings').where({ id: rec.id }).first('failure_code', 'failure_message')).toEqual({
      failure_code: null,
      failure_message: null,
    });
  });

  it('409 not_retryable for a failure a retry cannot fix, and for a recording that has not failed', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    const truncated = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id, state: 'failed', failureCode: 'truncated' });
    const res = await owner.client.send('post', `/api/recordings/${truncated.id}/retry`);
    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({
      code: 'not_retryable',
      message: 'Processing this file again would fail the same way: upload a corrected file instead.',
    });
    expect(t.enqueued).not.toContain(truncated.id);
    const ready = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id });
    const again = await owner.client.send('post', `/api/recordings/${ready.id}/retry`);
    expect(again.body.error).toEqual({ code: 'not_retryable', message: 'This recording is ready: there is nothing to retry.' });
  });

  it('the retry route and the retryable flag agree for every failure code', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    for (const code of FAILURE_CODES) {
      const rec = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id, state: 'failed', failureCode: code });
      const flag = (await owner.client.get(`/api/recordings/${rec.id}`)).body.failure.retryable;
      const status = (await owner.client.send('post', `/api/recordings/${rec.id}/retry`)).status;
      expect({ code, status }).toEqual({ code, status: flag ? 200 : 409 });
    }
  });

  it('403 for a colleague', async () => {
    const school = await buildSchool(t.db);
    const owner = await buildMember(t.db, { roles: ['teacher'], schoolId: school.id });
    const colleague = await member(['teacher'], school.id);
    const rec = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id, state: 'failed', failureCode: 'processing_error' });
    expect((await colleague.client.send('post', `/api/recordings/${rec.id}/retry`)).status).toBe(403);
    expect(t.enqueued).not.toContain(rec.id);
  });
});
