import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAILURE_CODES, RecordingDetailDtoSchema, RecordingListDtoSchema } from '@core/contracts';
import { Client, createTestApp, signedInClient, type TestApp } from '../../../test/test-app';
import { buildMember, buildSchool } from '../../../test/factories';
import { insertOpenUpload, insertReadyRecording, insertRecording, patternBytes } from './test-recordings';
import { RETRYABLE_FAILURES } from './retry-rule';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function member(roles: ('teacher' | 'admin' | 'student')[], schoolId?: string) {
  const person = await buildMember(t.db, { roles, schoolId });
  return { ...person, client: await signedInClient(t, person.email) };
}

const titles = (body: { recordings: { title: string }[] }) => body.recordings.map((r) => r.title);

describe('GET /api/recordings', () => {
  it('401 signed out, 403 for a student', async () => {
    expect((await new Client(t).get('/api/recordings')).status).toBe(401);
    const student = await member(['student']);
    const res = await student.client.get('/api/recordings');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });

  it('400 names a bad sort', async () => {
    const teacher = await member(['teacher']);
    const res = await teacher.client.get('/api/recordings?sort=colour');
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('sort');
  });

  it('searches title and original file name case-insensitively, filters by state and owner, and sorts', async () => {
    const school = await buildSchool(t.db);
    const me = await member(['teacher'], school.id);
    const colleague = await buildMember(t.db, { roles: ['teacher'], schoolId: school.id });
    const day = (n: number) => new Date(Date.UTC(2026, 0, n));
    await insertRecording(t.db, {
      schoolId: school.id,
      ownerId: me.id,
      title: 'Pendulum swing',
      originalFileName: 'IMG_0001.MOV',
      createdAt: day(1),
      durationSeconds: 30,
      storedSize: 300,
    });
    await insertRecording(t.db, {
      schoolId: school.id,
      ownerId: colleague.id,
      title: 'Falling magnet',
      originalFileName: 'copper-tube.mp4',
      createdAt: day(2),
      durationSeconds: 90,
      storedSize: 100,
    });
    await insertRecording(t.db, {
      schoolId: school.id,
      ownerId: me.id,
      title: 'air track 100% run',
      originalFileName: 'track.mp4',
      state: 'failed',
      createdAt: day(3),
      durationSeconds: null,
      storedSize: 900,
    });
    await insertRecording(t.db, {
      schoolId: school.id,
      ownerId: me.id,
      title: 'Copper coil',
      originalFileName: 'coil.mp4',
      state: 'processing',
      progress: 40,
      createdAt: day(4),
      durationSeconds: 10,
      storedSize: 50,
    });
    // Another school's recording never appears, whatever the search.
    const elsewhere = await buildSchool(t.db);
    await insertRecording(t.db, { schoolId: elsewhere.id, ownerId: null, title: 'Copper elsewhere' });

    const all = await me.client.get('/api/recordings');
    expect(all.status).toBe(200);
    RecordingListDtoSchema.parse(all.body);
    expect(titles(all.body)).toEqual(['Copper coil', 'air track 100% run', 'Falling magnet', 'Pendulum swing']);

    expect(titles((await me.client.get('/api/recordings?q=COPPER')).body)).toEqual(['Copper coil', 'Falling magnet']);
    expect(titles((await me.client.get('/api/recordings?q=img_0001')).body)).toEqual(['Pendulum swing']);
    // % and _ are searched for as characters, not as LIKE wildcards.
    expect(titles((await me.client.get('/api/recordings?q=100%25')).body)).toEqual(['air track 100% run']);
    expect(titles((await me.client.get('/api/recordings?q=_')).body)).toEqual(['Pendulum swing']);
    expect(titles((await me.client.get('/api/recordings?state=failed')).body)).toEqual(['air track 100% run']);
    expect(titles((await me.client.get('/api/recordings?owner=mine')).body)).toEqual([
      'Copper coil',
      'air track 100% run',
      'Pendulum swing',
    ]);
    expect(titles((await me.client.get('/api/recordings?sort=oldest')).body)).toEqual([
      'Pendulum swing',
      'Falling magnet',
      'air track 100% run',
      'Copper coil',
    ]);
    expect(titles((await me.client.get('/api/recordings?sort=title')).body)).toEqual([
      'air track 100% run',
      'Copper coil',
      'Falling magnet',
      'Pendulum swing',
    ]);
    expect(titles((await me.client.get('/api/recordings?sort=duration')).body)).toEqual([
      'Falling magnet',
      'Pendulum swing',
      'Copper coil',
      'air track 100% run',
    ]);
    expect(titles((await me.client.get('/api/recordings?sort=size')).body)).toEqual([
      'air track 100% run',
      'Pendulum swing',
      'Falling magnet',
      'Copper coil',
    ]);
  });

  it('shows an unfinished upload to its owner, with its upload id, and to nobody else', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    const colleague = await member(['teacher'], school.id);
    const rec = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id, state: 'uploading', title: 'Half sent' });
    const uploadId = await insertOpenUpload(t.db, rec, owner);
    const mine = await owner.client.get('/api/recordings');
    expect(mine.body.recordings).toHaveLength(1);
    expect(mine.body.recordings[0]).toMatchObject({
      title: 'Half sent',
      state: 'uploading',
      uploadId,
      canEdit: true,
      posterUrl: null,
    });
    expect((await colleague.client.get('/api/recordings')).body.recordings).toEqual([]);
    expect((await colleague.client.get(`/api/recordings/${rec.id}`)).status).toBe(404);
  });
});

describe('GET /api/recordings/:recordingId', () => {
  it('400 for a malformed id, 404 for an unknown one', async () => {
    const teacher = await member(['teacher']);
    const bad = await teacher.client.get('/api/recordings/not-an-id');
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('recordingId: Expected an id (a UUID).');
    const unknown = await teacher.client.get('/api/recordings/00000000-0000-4000-8000-000000000000');
    expect(unknown.status).toBe(404);
    expect(unknown.body.error).toEqual({ code: 'not_found', message: 'That recording was not found.' });
  });

  it('returns the detail with a working poster URL, the owner, and what the caller may do', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    const colleague = await member(['teacher'], school.id);
    const rec = await insertReadyRecording(t.db, t.storage, { schoolId: school.id, ownerId: owner.id, title: 'Eddy currents' });
    const res = await owner.client.get(`/api/recordings/${rec.id}`);
    expect(res.status).toBe(200);
    const detail = RecordingDetailDtoSchema.parse(res.body);
    expect(detail).toMatchObject({ title: 'Eddy currents', state: 'ready', canEdit: true, failure: null, captions: [], uploadId: null });
    expect(detail.owner).toEqual({ id: owner.id, name: owner.name });
    const poster = await fetch(detail.posterUrl!);
    expect(poster.status).toBe(200);
    expect(Buffer.from(await poster.arrayBuffer())).toEqual(patternBytes(500, 3));
    expect((await colleague.client.get(`/api/recordings/${rec.id}`)).body.canEdit).toBe(false);
  });

  it('maps each failure code with its sentence and whether a retry is offered', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    for (const code of FAILURE_CODES) {
      const rec = await insertRecording(t.db, {
        schoolId: school.id,
        ownerId: owner.id,
        state: 'failed',
        failureCode: code,
        failureMessage: `Because ${code}.`,
      });
      const res = await owner.client.get(`/api/recordings/${rec.id}`);
      expect(res.body.failure).toEqual({ code, message: `Because ${code}.`, retryable: RETRYABLE_FAILURES.has(code) });
    }
  });
});

describe('PATCH /api/recordings/:recordingId', () => {
  it('400 with the exact message for an empty or long title', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    const rec = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id });
    const empty = await owner.client.send('patch', `/api/recordings/${rec.id}`, { title: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toBe('title: Enter a title.');
    const long = await owner.client.send('patch', `/api/recordings/${rec.id}`, { title: 'x'.repeat(201) });
    expect(long.body.error.message).toBe('title: A title has at most 200 characters.');
  });

  it('403 for a colleague; the owner and an admin rename it', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(['teacher'], school.id);
    const colleague = await member(['teacher'], school.id);
    const admin = await member(['admin'], school.id);
    const rec = await insertRecording(t.db, { schoolId: school.id, ownerId: owner.id, title: 'Before' });
    const refused = await colleague.client.send('patch', `/api/recordings/${rec.id}`, { title: 'Mine now' });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toBe('Only the teacher who uploaded this recording, or an admin of the school, can change it.');
    const renamed = await owner.client.send('patch', `/api/recordings/${rec.id}`, { title: '  Magnet through a copper tube  ' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.title).toBe('Magnet through a copper tube');
    const byAdmin = await admin.client.send('patch', `/api/recordings/${rec.id}`, { title: 'Tidied by the admin' });
    expect(byAdmin.status).toBe(200);
    expect((await t.db('recordings').where({ id: rec.id }).first('title')).title).toBe('Tidied by the admin');
  });
});
