import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { UploadDto } from '@core/contracts';
import { createTestApp, signedInClient, type Client, type TestApp } from '../../../test/test-app';
import { buildMember } from '../../../test/factories';
import { deleteSchoolObjects, fakeFile, MIB, sendParts, startUpload } from './uploads.test-support';

let t: TestApp;
let upload: UploadDto;
let owner: Client;
let parts: { partNumber: number; etag: string }[];
const file = fakeFile(11 * MIB);

beforeAll(async () => {
  t = await createTestApp();
  const person = await buildMember(t.db, { roles: ['teacher'] });
  owner = await signedInClient(t, person.email);
  upload = await startUpload(owner, file.create);
  parts = await sendParts(owner, upload, file.bytes, [1]);
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

/** Every route that names an upload, as an outsider would call it. */
function attempts(client: Client) {
  return [
    ['resume', () => client.send('post', `/api/uploads/${upload.id}/resume`, file.facts)],
    ['list parts', () => client.get(`/api/uploads/${upload.id}/parts`)],
    ['sign a part', () => client.send('post', `/api/uploads/${upload.id}/parts/2`)],
    ['complete', () => client.send('post', `/api/uploads/${upload.id}/complete`, { parts })],
    ['cancel', () => client.send('delete', `/api/uploads/${upload.id}`)],
  ] as const;
}

async function expectHidden(client: Client) {
  for (const [name, attempt] of attempts(client)) {
    const res = await attempt();
    expect({ name, status: res.status, error: res.body.error }).toEqual({
      name,
      status: 404,
      error: { code: 'not_found', message: 'That upload was not found.' },
    });
  }
  expect((await client.get('/api/uploads')).body.uploads).toEqual([]);
}

describe('an upload is its owner’s alone', () => {
  it('a teacher of another school gets 404 on every route', async () => {
    const outsider = await buildMember(t.db, { roles: ['teacher', 'admin'] });
    await expectHidden(await signedInClient(t, outsider.email));
  });

  it('another teacher, or an admin, of the same school gets 404 too', async () => {
    const colleague = await buildMember(t.db, {
      roles: ['teacher'],
      schoolId: (await t.db('uploads').where({ id: upload.id }).first('school_id')).school_id,
    });
    await expectHidden(await signedInClient(t, colleague.email));
    const admin = await buildMember(t.db, { roles: ['admin', 'teacher'], schoolId: colleague.schoolId });
    await expectHidden(await signedInClient(t, admin.email));
  });

  it('after all that, the owner’s upload is untouched and still completes', async () => {
    expect(await t.db('uploads').where({ id: upload.id }).first('status')).toEqual({ status: 'uploading' });
    const rest = await sendParts(owner, upload, file.bytes, [2]);
    const done = await owner.send('post', `/api/uploads/${upload.id}/complete`, { parts: [...parts, ...rest] });
    expect(done.status).toBe(200);
    expect(done.body.state).toBe('processing');
  });

  it('answers 400, not a database error, for a malformed upload id', async () => {
    const res = await owner.get('/api/uploads/not-an-id/parts');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('uploadId: Expected an id (a UUID).');
  });
});
