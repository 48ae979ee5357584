import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { LessonContent } from '@core/contracts';
import { LIMITS } from '@core/limits';
import { newCheckpoint } from '@core/lessons';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildSchool } from '../../../test/factories';
import { insertRecording } from '../recordings/test-recordings';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { createBody, createLesson, goodNote, member, readyRecording } from './lessons.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const UNKNOWN = '00000000-0000-4000-8000-000000000000';

describe('the lessons routes refuse bad input with a specific message', () => {
  it('401 signed out on every route; 403 for a student', async () => {
    const anonymous = new Client(t);
    expect((await anonymous.get('/api/lessons')).status).toBe(401);
    expect((await anonymous.get(`/api/lessons/${UNKNOWN}`)).status).toBe(401);
    expect((await anonymous.send('post', '/api/lessons', {})).status).toBe(401);
    expect((await anonymous.send('put', `/api/lessons/${UNKNOWN}/draft`, {})).status).toBe(401);
    const student = await member(t, ['student']);
    const res = await student.client.get('/api/lessons');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect((await student.client.send('post', `/api/lessons/${UNKNOWN}/duplicate`)).status).toBe(403);
  });

  it('400 for a bad list query and a malformed id', async () => {
    const teacher = await member(t, ['teacher']);
    const sort = await teacher.client.get('/api/lessons?sort=colour');
    expect(sort.status).toBe(400);
    expect(sort.body.error.details[0].path).toBe('sort');
    const state = await teacher.client.get('/api/lessons?state=deleted');
    expect(state.body.error.details[0].path).toBe('state');
    const owner = await teacher.client.get('/api/lessons?owner=somebody');
    expect(owner.status).toBe(400);
    expect(owner.body.error.details[0].path).toBe('owner');
    const id = await teacher.client.get('/api/lessons/not-an-id');
    expect(id.status).toBe(400);
    expect(id.body.error.message).toBe('lessonId: Expected an id (a UUID).');
    const version = await teacher.client.get(`/api/lessons/${UNKNOWN}/versions/0`);
    expect(version.status).toBe(400);
    expect(version.body.error.message).toBe('number: Versions are numbered from 1.');
  });

  it('400 for every bad create body; 400 recording_not_ready; 404 for another school’s recording', async () => {
    const school = await buildSchool(t.db);
    const teacher = await member(t, ['teacher'], { schoolId: school.id });
    const recording = await readyRecording(t, teacher);
    const refuse = async (body: Record<string, unknown>, path: string, message: string) => {
      const res = await teacher.client.send('post', '/api/lessons', body);
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
      expect(res.body.error.details).toContainEqual({ path, message });
    };
    await refuse(createBody(recording.id, { title: '   ' }), 'title', 'Give the lesson a title.');
    await refuse(
      createBody(recording.id, { title: 'x'.repeat(LIMITS.lessonTitleMax + 1) }),
      'title',
      'A title has at most 200 characters.',
    );
    await refuse(createBody(recording.id, { title: 42 }), 'title', 'Give the lesson a title.');
    await refuse(createBody(recording.id, { tags: Array.from({ length: 13 }, (_, i) => `tag${i}`) }), 'tags', 'At most 12 tags.');
    await refuse(createBody(recording.id, { tags: ['ok', ''] }), 'tags.1', 'A tag cannot be empty.');
    await refuse(
      createBody(recording.id, { description: 'x'.repeat(4001) }),
      'description',
      'The description has at most 4000 characters.',
    );
    await refuse(createBody('nope'), 'recordingId', 'Expected an id (a UUID).');
    expect(await t.db('lessons').where({ school_id: school.id })).toHaveLength(0);

    const processing = await insertRecording(t.db, { schoolId: school.id, ownerId: teacher.id, state: 'processing', title: 'Still going' });
    const notReady = await teacher.client.send('post', '/api/lessons', createBody(processing.id));
    expect(notReady.status).toBe(400);
    expect(notReady.body.error).toEqual({
      code: 'recording_not_ready',
      message: '“Still going” is not ready to play yet (processing), so a lesson cannot be built on it. Choose a ready recording.',
      details: [
        {
          path: 'recordingId',
          message: '“Still going” is not ready to play yet (processing), so a lesson cannot be built on it. Choose a ready recording.',
        },
      ],
    });

    const elsewhere = await member(t, ['teacher']);
    const theirs = await readyRecording(t, elsewhere);
    const foreign = await teacher.client.send('post', '/api/lessons', createBody(theirs.id));
    expect(foreign.status).toBe(404);
    expect(foreign.body.error.message).toBe('That recording was not found.');
    const substitute = await member(t, ['substitute'], { schoolId: school.id });
    expect((await substitute.client.send('post', '/api/lessons', createBody(recording.id))).status).toBe(403);
  });

  it('400 for every bad draft: unknown kind, too many checkpoints, long title, wrong types; nothing saved changes', async () => {
    const teacher = await member(t, ['teacher']);
    const recording = await readyRecording(t, teacher);
    const lesson = await createLesson(teacher.client, recording.id);
    const good: LessonContent = { ...lesson.draft, checkpoints: [goodNote(1_000)] };
    const put = (body: unknown) => teacher.client.send('put', `/api/lessons/${lesson.id}/draft`, body);
    expect((await put({ revision: 0, content: good })).status).toBe(200);

    const refuse = async (body: unknown, path: string, message?: string) => {
      const res = await put(body);
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(res.body.error.code).toBe('validation_failed');
      const paths = res.body.error.details.map((d: { path: string }) => d.path);
      expect(paths).toContain(path);
      if (message) expect(res.body.error.details).toContainEqual({ path, message });
    };
    const withCheckpoint = (checkpoint: unknown) => ({ revision: 1, content: { ...good, checkpoints: [checkpoint] } });
    await refuse(withCheckpoint({ ...goodNote(1_000), kind: 'hologram' }), 'content.checkpoints.0.kind');
    await refuse(
      { revision: 1, content: { ...good, checkpoints: Array.from({ length: LIMITS.checkpointsMax + 1 }, (_, i) => goodNote(i * 1000)) } },
      'content.checkpoints',
      'At most 200 checkpoints.',
    );
    await refuse(
      { revision: 1, content: { ...good, settings: { ...good.settings, title: 'x'.repeat(201) } } },
      'content.settings.title',
      'A title has at most 200 characters.',
    );
    await refuse(withCheckpoint({ ...goodNote(1_000), atMs: '1000' }), 'content.checkpoints.0.atMs', 'Expected the time in milliseconds.');
    await refuse(
      withCheckpoint({ ...goodNote(1_000), atMs: -5 }),
      'content.checkpoints.0.atMs',
      'The time cannot be before the start of the recording.',
    );
    await refuse(
      withCheckpoint({ ...newCheckpoint('numeric', 1_000), points: 'lots' }),
      'content.checkpoints.0.points',
      'Expected points as a number.',
    );
    await refuse(
      withCheckpoint({ ...goodNote(1_000), key: 'UPPER' }),
      'content.checkpoints.0.key',
      'A key has 6 to 32 lowercase letters and digits.',
    );
    await refuse({ revision: 'one', content: good }, 'revision');
    await refuse({ revision: 1 }, 'content');
    await refuse({ revision: 1, content: { ...good, settings: { ...good.settings, minSpacingMs: 0 } } }, 'content.settings.minSpacingMs');
    // None of the refused bodies touched what was saved.
    const stored = (await teacher.client.get(`/api/lessons/${lesson.id}`)).body;
    expect(stored.revision).toBe(1);
    expect(stored.draft).toEqual(good);
  });

  it('400 for a bad PATCH or publish body', async () => {
    const teacher = await member(t, ['teacher']);
    const recording = await readyRecording(t, teacher);
    const lesson = await createLesson(teacher.client, recording.id);
    const empty = await teacher.client.send('patch', `/api/lessons/${lesson.id}`, {});
    expect(empty.status).toBe(400);
    expect(empty.body.error.message).toBe('Send shared or archived.');
    const wrong = await teacher.client.send('patch', `/api/lessons/${lesson.id}`, { shared: 'yes' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.details[0].path).toBe('shared');
    const note = await teacher.client.send('post', `/api/lessons/${lesson.id}/publish`, { revision: 0, note: 'x'.repeat(501) });
    expect(note.status).toBe(400);
    expect(note.body.error.message).toBe('note: A note has at most 500 characters.');
    const noRevision = await teacher.client.send('post', `/api/lessons/${lesson.id}/publish`, { note: '' });
    expect(noRevision.status).toBe(400);
    expect(noRevision.body.error.details[0].path).toBe('revision');
  });
});
