import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LessonDtoSchema, PlaybackDtoSchema, type LessonContent } from '@core/contracts';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { buildDepartment, buildSchool } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { createLesson, goodNote, goodQuestion, member, readyRecording, saveDraft, type Member } from './lessons.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

/** A school with a physics department: its teacher's lesson (two checkpoints, a chapter, a caption track). */
async function department() {
  const school = await buildSchool(t.db);
  const physics = await buildDepartment(t.db, school.id);
  const owner = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
  const recording = await readyRecording(t, owner);
  await t.db('recording_captions').insert({
    recording_id: recording.id,
    language: 'en',
    label: 'English',
    is_default: true,
    vtt: 'WEBVTT\n\n00:01.000 --> 00:02.000\nHello\n',
    cue_count: 1,
  });
  const lesson = await createLesson(owner.client, recording.id);
  const content: LessonContent = {
    ...lesson.draft,
    checkpoints: [goodQuestion(2_000), goodNote(5_000)],
    chapters: [{ key: 'chapterone1', title: 'Set-up', startMs: 0, endMs: 4_000 }],
  };
  await saveDraft(owner.client, lesson.id, 0, content);
  return { school, physics, owner, recording, lesson, content };
}

/** Every lesson route a viewer or editor can call, as [method, path, body]. */
function everyRoute(lessonId: string, captionId: string): ['get' | 'post' | 'put' | 'patch' | 'delete', string, unknown?][] {
  return [
    ['get', `/api/lessons/${lessonId}`],
    [
      'put',
      `/api/lessons/${lessonId}/draft`,
      {
        revision: 1,
        content: {
          settings: { title: 'x', description: '', tags: [], level: '', safetyNotes: '', minSpacingMs: 500 },
          chapters: [],
          checkpoints: [],
        },
      },
    ],
    ['patch', `/api/lessons/${lessonId}`, { shared: true }],
    ['post', `/api/lessons/${lessonId}/publish`, { revision: 1, note: '' }],
    ['get', `/api/lessons/${lessonId}/versions`],
    ['get', `/api/lessons/${lessonId}/versions/1`],
    ['post', `/api/lessons/${lessonId}/duplicate`],
    ['get', `/api/lessons/${lessonId}/playback`],
    ['get', `/api/lessons/${lessonId}/thumbnails.vtt`],
    ['get', `/api/lessons/${lessonId}/captions/${captionId}.vtt`],
    ['delete', `/api/lessons/${lessonId}`],
  ];
}

async function call(who: Member, method: 'get' | 'post' | 'put' | 'patch' | 'delete', path: string, body?: unknown) {
  return method === 'get' ? who.client.get(path) : who.client.send(method, path, body);
}

async function captionIdOf(recordingId: string): Promise<string> {
  return (await t.db('recording_captions').where({ recording_id: recordingId }).first('id')).id;
}

describe('who may see, change and copy a lesson', () => {
  it('another school’s admin, teacher and substitute get 404 on every route, and see nothing in the list', async () => {
    const { lesson, recording } = await department();
    await t.db('lessons').where({ id: lesson.id }).update({ shared: true });
    const captionId = await captionIdOf(recording.id);
    const other = await buildSchool(t.db);
    for (const roles of [['admin'], ['teacher'], ['substitute'], ['coordinator', 'teacher']] as const) {
      const outsider = await member(t, [...roles], { schoolId: other.id });
      for (const [method, path, body] of everyRoute(lesson.id, captionId)) {
        const res = await call(outsider, method, path, body);
        // Roles without access to a route at all are refused by role before any lookup.
        if (res.status === 403) {
          expect(res.body.error.message, `${roles.join('+')} ${method} ${path}`).toMatch(/^This needs the/);
          continue;
        }
        expect(res.status, `${roles.join('+')} ${method} ${path}`).toBe(404);
        expect(res.body.error.message).toBe('That lesson was not found.');
      }
      expect((await outsider.client.get('/api/lessons')).body).toEqual({ lessons: [], tags: [], owners: [] });
    }
  });

  it('a colleague cannot see an unshared lesson; once shared they view it, read-only, and copy it', async () => {
    const { school, physics, lesson, owner } = await department();
    const colleague = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
    expect((await colleague.client.get(`/api/lessons/${lesson.id}`)).status).toBe(404);
    expect((await colleague.client.get('/api/lessons')).body.lessons).toEqual([]);

    const shared = await owner.client.send('patch', `/api/lessons/${lesson.id}`, { shared: true });
    expect(shared.status).toBe(200);
    expect(shared.body.shared).toBe(true);
    const seen = await colleague.client.get(`/api/lessons/${lesson.id}`);
    expect(seen.status).toBe(200);
    expect(seen.body.canEdit).toBe(false);
    expect((await colleague.client.get('/api/lessons')).body.lessons.map((l: { id: string }) => l.id)).toEqual([lesson.id]);
    const edit = await colleague.client.send('put', `/api/lessons/${lesson.id}/draft`, { revision: 1, content: seen.body.draft });
    expect(edit.status).toBe(403);
    expect(edit.body.error.message).toBe(
      'Only the teacher who made this lesson, or an admin of the school, can change it. You can duplicate it.',
    );
    for (const [method, path, body] of [
      ['patch', `/api/lessons/${lesson.id}`, { archived: true }],
      ['post', `/api/lessons/${lesson.id}/publish`, { revision: 1, note: '' }],
      ['delete', `/api/lessons/${lesson.id}`],
    ] as const) {
      expect((await call(colleague, method, path, body)).status, `${method} ${path}`).toBe(403);
    }
    expect(await t.db('lessons').where({ id: lesson.id }).first('revision', 'archived_at')).toEqual({ revision: 1, archived_at: null });

    // A teacher of another department of the same school does not see it, shared or not.
    const chemistry = await buildDepartment(t.db, school.id, 'Chemistry');
    const outsider = await member(t, ['teacher'], { schoolId: school.id, departmentId: chemistry.id });
    expect((await outsider.client.get(`/api/lessons/${lesson.id}`)).status).toBe(404);

    const audit = await t.db('audit_events').where({ school_id: school.id, action: 'lesson_shared' }).select('actor_id', 'data');
    expect(audit.map((row) => [row.actor_id, row.data.lessonId])).toEqual([[owner.id, lesson.id]]);
  });

  it('a substitute sees shared lessons of any department, plays them, copies one with new keys, and cannot change the original', async () => {
    const { school, lesson, owner, content, recording } = await department();
    const substitute = await member(t, ['substitute'], { schoolId: school.id });
    expect((await substitute.client.get(`/api/lessons/${lesson.id}`)).status).toBe(404);
    await owner.client.send('patch', `/api/lessons/${lesson.id}`, { shared: true });
    const listed = (await substitute.client.get('/api/lessons')).body;
    expect(listed.lessons.map((l: { id: string }) => l.id)).toEqual([lesson.id]);
    expect(listed.owners).toEqual([{ id: owner.id, name: owner.name }]);
    const seen = (await substitute.client.get(`/api/lessons/${lesson.id}`)).body;
    expect(seen.canEdit).toBe(false);
    expect((await substitute.client.send('put', `/api/lessons/${lesson.id}/draft`, { revision: 1, content })).status).toBe(403);
    expect((await substitute.client.send('patch', `/api/lessons/${lesson.id}`, { shared: false })).status).toBe(403);

    // Playback without the recordings library: the track URLs are the lesson's own routes.
    const playback = PlaybackDtoSchema.parse((await substitute.client.get(`/api/lessons/${lesson.id}/playback`)).body);
    expect(playback.recordingId).toBe(recording.id);
    expect(playback.thumbnailsUrl).toBe(`/api/lessons/${lesson.id}/thumbnails.vtt`);
    const captionId = await captionIdOf(recording.id);
    expect(playback.captions.map((c) => c.url)).toEqual([`/api/lessons/${lesson.id}/captions/${captionId}.vtt`]);
    expect((await fetch(playback.src.url)).status).toBe(200);
    const thumbnails = await substitute.client.get(playback.thumbnailsUrl!);
    expect(thumbnails.status).toBe(200);
    expect(thumbnails.headers['content-type']).toBe('text/vtt; charset=utf-8');
    expect(thumbnails.text.startsWith('WEBVTT')).toBe(true);
    const caption = await substitute.client.get(playback.captions[0]!.url);
    expect(caption.text).toContain('Hello');
    expect((await substitute.client.get(`/api/lessons/${lesson.id}/captions/00000000-0000-4000-8000-000000000000.vtt`)).status).toBe(404);
    // The recordings library itself stays teachers' and admins'.
    expect((await substitute.client.get(`/api/recordings/${recording.id}/playback`)).status).toBe(403);

    const copy = await substitute.client.send('post', `/api/lessons/${lesson.id}/duplicate`);
    expect(copy.status).toBe(201);
    const duplicate = LessonDtoSchema.parse(copy.body);
    expect(duplicate).toMatchObject({
      title: 'Copy of Field of a flat coil',
      owner: { id: substitute.id, name: substitute.name },
      state: 'draft',
      shared: false,
      revision: 0,
      publishedVersion: null,
      checkpointCount: 2,
    });
    const stored = await t.db('lessons').where({ id: duplicate.id }).first('copied_from_id', 'department_id', 'school_id');
    expect(stored).toEqual({ copied_from_id: lesson.id, department_id: null, school_id: school.id });
    expectCopied(duplicate.draft, content);
    // The copy is the substitute's own: they open it, edit it and find it in their list.
    const own = (await substitute.client.get(`/api/lessons/${duplicate.id}`)).body;
    expect(own.canEdit).toBe(true);
    const edited = { ...duplicate.draft, settings: { ...duplicate.draft.settings, title: 'Cover lesson: flat coil' } };
    expect((await substitute.client.send('put', `/api/lessons/${duplicate.id}/draft`, { revision: 0, content: edited })).status).toBe(200);
    const mine = (await substitute.client.get('/api/lessons?owner=me')).body;
    expect(mine.lessons.map((l: { title: string }) => l.title)).toEqual(['Cover lesson: flat coil']);
  });

  it('a teacher’s copy of a colleague’s shared lesson lands in their department with new keys; the original is untouched', async () => {
    const { school, physics, lesson, owner, content } = await department();
    await owner.client.send('patch', `/api/lessons/${lesson.id}`, { shared: true });
    const colleague = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
    const long = 'L'.repeat(195);
    await t
      .db('lessons')
      .where({ id: lesson.id })
      .update({ title: long, draft: JSON.stringify({ ...content, settings: { ...content.settings, title: long } }) });
    const copy = (await colleague.client.send('post', `/api/lessons/${lesson.id}/duplicate`)).body;
    expect(copy.title).toBe(`Copy of ${'L'.repeat(192)}`);
    expect(copy.title).toHaveLength(200);
    expect(copy.canEdit).toBe(true);
    expect((await t.db('lessons').where({ id: copy.id }).first('department_id')).department_id).toBe(physics.id);
    expectCopied(copy.draft, content);
    // The colleague edits the copy; the original keeps its draft.
    await saveDraft(colleague.client, copy.id, 0, { ...copy.draft, checkpoints: [] });
    expect((await owner.client.get(`/api/lessons/${lesson.id}`)).body.draft.checkpoints).toHaveLength(2);
    // An admin cannot copy (admins keep no library), but edits the original.
    const admin = await member(t, ['admin'], { schoolId: school.id });
    expect((await admin.client.send('post', `/api/lessons/${lesson.id}/duplicate`)).status).toBe(403);
    const byAdmin = await admin.client.send('patch', `/api/lessons/${lesson.id}`, { archived: true });
    expect(byAdmin.status).toBe(200);
    expect(byAdmin.body.state).toBe('archived');
    expect(byAdmin.body.canEdit).toBe(true);
  });

  it('a coordinator views every lesson of their department, shared or not, and cannot change it', async () => {
    const { school, physics, lesson } = await department();
    const coordinator = await member(t, ['coordinator'], { schoolId: school.id, departmentId: physics.id });
    const seen = await coordinator.client.get(`/api/lessons/${lesson.id}`);
    expect(seen.status).toBe(200);
    expect(seen.body.canEdit).toBe(false);
    expect((await coordinator.client.get(`/api/lessons/${lesson.id}/versions`)).body).toEqual({ versions: [] });
    expect((await coordinator.client.send('patch', `/api/lessons/${lesson.id}`, { shared: true })).status).toBe(403);
    expect((await coordinator.client.send('post', `/api/lessons/${lesson.id}/duplicate`)).status).toBe(403);
  });

  it('deletes a lesson never published; refuses to delete a published one and says to archive it', async () => {
    const { school, owner, lesson, recording } = await department();
    const draftOnly = await createLesson(owner.client, recording.id, { title: 'Scratch' });
    expect((await owner.client.send('delete', `/api/lessons/${draftOnly.id}`)).status).toBe(204);
    expect((await owner.client.get(`/api/lessons/${draftOnly.id}`)).status).toBe(404);

    expect((await owner.client.send('post', `/api/lessons/${lesson.id}/publish`, { revision: 1, note: '' })).status).toBe(201);
    const refused = await owner.client.send('delete', `/api/lessons/${lesson.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toEqual({
      code: 'lesson_published',
      message: '“Field of a flat coil” has published versions, so it cannot be deleted; archive it instead.',
    });
    expect(await t.db('lessons').where({ id: lesson.id }).first('id')).toBeDefined();
    const archived = await owner.client.send('patch', `/api/lessons/${lesson.id}`, { archived: true });
    expect(archived.body.state).toBe('archived');
    const restored = await owner.client.send('patch', `/api/lessons/${lesson.id}`, { archived: false });
    expect(restored.body.state).toBe('published');
    const audit = await t.db('audit_events').where({ school_id: school.id, action: 'lesson_deleted' }).select('data');
    expect(audit.map((row) => row.data)).toEqual([{ lessonId: draftOnly.id, title: 'Scratch' }]);
  });
});

/** The copy has the same checkpoints and chapters, each under a new key; option ids may stay. */
function expectCopied(copy: LessonContent, original: LessonContent): void {
  const withoutKey = <T extends { key: string }>({ key: _key, ...rest }: T) => rest;
  expect(copy.checkpoints.map(withoutKey)).toEqual(original.checkpoints.map(withoutKey));
  expect(copy.chapters.map(withoutKey)).toEqual(original.chapters.map(withoutKey));
  const originalKeys = new Set([...original.checkpoints, ...original.chapters].map((item) => item.key));
  const copyKeys = [...copy.checkpoints, ...copy.chapters].map((item) => item.key);
  expect(new Set(copyKeys).size).toBe(copyKeys.length);
  for (const key of copyKeys) expect(originalKeys.has(key), key).toBe(false);
}
