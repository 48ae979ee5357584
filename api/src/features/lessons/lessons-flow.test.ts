import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  DraftSavedDtoSchema,
  EditConflictDetailsSchema,
  LessonDtoSchema,
  LessonListDtoSchema,
  VersionDtoSchema,
  VersionSummaryDtoSchema,
  type LessonContent,
} from '@core/contracts';
import { LIMITS } from '@core/limits';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { buildSchool } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { createLesson, goodNote, goodQuestion, member, readyRecording, saveDraft } from './lessons.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

describe('a lesson from creation to its second version', () => {
  it('creates, lists, saves with problems, refuses a stale save and an unready publish, then publishes versions with their changes', async () => {
    const school = await buildSchool(t.db);
    const teacher = await member(t, ['teacher'], { schoolId: school.id });
    const recording = await readyRecording(t, teacher);

    // Create: a draft at revision 0 with the form's settings and the default spacing, nothing pinned.
    const created = LessonDtoSchema.parse(await createLesson(teacher.client, recording.id));
    expect(created).toMatchObject({
      title: 'Field of a flat coil',
      tags: ['magnetism', 'coils'],
      state: 'draft',
      revision: 0,
      shared: false,
      checkpointCount: 0,
      publishedVersion: null,
      unpublishedChanges: true,
      canEdit: true,
      problems: [],
      owner: { id: teacher.id, name: teacher.name },
      recording: { id: recording.id, title: 'Coil and compass (test)', durationMs: 12_000, ready: true },
    });
    expect(created.draft).toEqual({
      settings: {
        title: 'Field of a flat coil',
        description: 'We watch a compass needle near a coil.',
        tags: ['magnetism', 'coils'],
        level: 'Year 10',
        safetyNotes: '',
        minSpacingMs: LIMITS.defaultMinSpacingMs,
      },
      chapters: [],
      checkpoints: [],
    });
    const poster = await fetch(created.posterUrl!);
    expect(poster.status).toBe(200);

    const listed = LessonListDtoSchema.parse((await teacher.client.get('/api/lessons')).body);
    expect(listed.lessons.map((l) => l.id)).toEqual([created.id]);
    expect(listed.tags).toEqual(['coils', 'magnetism']);
    expect(listed.owners).toEqual([{ id: teacher.id, name: teacher.name }]);

    // A draft with problems is saved (autosave never loses typing) and the answer lists them.
    const unfinished = goodQuestion(2_000, '');
    const late = goodNote(15_000);
    const draft1: LessonContent = { ...created.draft, checkpoints: [unfinished, late] };
    const saved1 = DraftSavedDtoSchema.parse(await saveDraft(teacher.client, created.id, 0, draft1));
    expect(saved1.revision).toBe(1);
    expect(saved1.unpublishedChanges).toBe(true);
    expect(saved1.problems.map((p) => p.path)).toEqual(['checkpoints.1.atMs', 'checkpoints.0.prompt']);
    const reopened = (await teacher.client.get(`/api/lessons/${created.id}`)).body;
    expect(reopened.draft).toEqual(draft1);
    expect(reopened).toMatchObject({ revision: 1, checkpointCount: 2, savedBy: { id: teacher.id, name: teacher.name } });
    expect(reopened.problems).toEqual(saved1.problems);

    // A second tab still at revision 0 is told who saved, and its edit overwrites nothing.
    const stale = await teacher.client.send('put', `/api/lessons/${created.id}/draft`, { revision: 0, content: created.draft });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('edit_conflict');
    expect(EditConflictDetailsSchema.parse(stale.body.error.details)).toEqual({
      revision: 1,
      savedAt: saved1.savedAt,
      savedBy: teacher.name,
    });
    expect(stale.body.error.message).toContain(`by ${teacher.name}`);
    expect((await teacher.client.get(`/api/lessons/${created.id}`)).body.draft).toEqual(draft1);

    // Publishing: the revision must be the stored one, then the problems must be gone.
    const stalePublish = await teacher.client.send('post', `/api/lessons/${created.id}/publish`, { revision: 0, note: '' });
    expect(stalePublish.status).toBe(409);
    expect(stalePublish.body.error.code).toBe('edit_conflict');
    const refused = await teacher.client.send('post', `/api/lessons/${created.id}/publish`, { revision: 1, note: '' });
    expect(refused.status).toBe(400);
    expect(refused.body.error.code).toBe('lesson_not_ready');
    expect(refused.body.error.details).toEqual(saved1.problems);
    expect(refused.body.error.message).toBe(`Fix the lesson’s problems before publishing: ${saved1.problems[0]!.message} (and 1 more)`);
    expect(await t.db('lesson_versions').where({ lesson_id: created.id })).toHaveLength(0);

    // Fixed: both checkpoints meet the rules; version 1 lists them as added.
    const question = goodQuestion(2_000);
    const note = goodNote(6_000);
    const draft2: LessonContent = { ...draft1, checkpoints: [question, note] };
    const saved2 = await saveDraft(teacher.client, created.id, 1, draft2);
    expect(saved2).toMatchObject({ revision: 2, problems: [], unpublishedChanges: true });
    const v1 = await teacher.client.send('post', `/api/lessons/${created.id}/publish`, { revision: 2, note: '  First run  ' });
    expect(v1.status).toBe(201);
    expect(VersionSummaryDtoSchema.parse(v1.body)).toMatchObject({
      number: 1,
      note: 'First run',
      checkpointCount: 2,
      publishedBy: { id: teacher.id, name: teacher.name },
    });
    expect(v1.body.changes.added.map((c: { key: string }) => c.key)).toEqual([question.key, note.key]);
    expect(v1.body.changes.removed).toEqual([]);
    const afterV1 = (await teacher.client.get(`/api/lessons/${created.id}`)).body;
    expect(afterV1).toMatchObject({ state: 'published', publishedVersion: 1, unpublishedChanges: false });

    // Publishing the same content again is refused.
    const again = await teacher.client.send('post', `/api/lessons/${created.id}/publish`, { revision: 2, note: '' });
    expect(again.status).toBe(409);
    expect(again.body.error).toEqual({
      code: 'nothing_to_publish',
      message: 'Nothing has changed since version 1 was published. Edit the lesson, then publish again.',
    });

    // Edit after publishing: the question's prompt changes, the note goes, a new note comes; keys stay.
    const edited = { ...question, prompt: 'Which way does the needle turn now?' };
    const added = goodNote(9_000, 'The current is reversed here.');
    const draft3: LessonContent = {
      ...draft2,
      settings: { ...draft2.settings, title: 'Field of a flat coil, revised' },
      checkpoints: [edited, added],
    };
    const saved3 = await saveDraft(teacher.client, created.id, 2, draft3);
    expect(saved3).toMatchObject({ revision: 3, unpublishedChanges: true, problems: [] });
    const v2 = await teacher.client.send('post', `/api/lessons/${created.id}/publish`, { revision: 3, note: 'Reversed current' });
    expect(v2.status).toBe(201);
    expect(v2.body.number).toBe(2);
    expect(v2.body.changes.added.map((c: { key: string }) => c.key)).toEqual([added.key]);
    expect(v2.body.changes.removed.map((c: { key: string }) => c.key)).toEqual([note.key]);
    expect(v2.body.changes.edited).toEqual([expect.objectContaining({ key: question.key, fields: ['prompt'] })]);
    expect(v2.body.changes.settings).toEqual(['title']);

    // Versions are immutable: more edits leave version 1's content as it was published.
    await saveDraft(teacher.client, created.id, 3, { ...draft3, checkpoints: [] });
    const versions = (await teacher.client.get(`/api/lessons/${created.id}/versions`)).body.versions;
    expect(versions.map((v: { number: number }) => v.number)).toEqual([2, 1]);
    const first = VersionDtoSchema.parse((await teacher.client.get(`/api/lessons/${created.id}/versions/1`)).body);
    expect(first.content).toEqual(draft2);
    expect(first.note).toBe('First run');
    const second = (await teacher.client.get(`/api/lessons/${created.id}/versions/2`)).body;
    expect(second.content).toEqual(draft3);
    const missing = await teacher.client.get(`/api/lessons/${created.id}/versions/3`);
    expect(missing.status).toBe(404);
    expect(missing.body.error.message).toBe('Version 3 of this lesson was not found.');
    const lesson = (await teacher.client.get(`/api/lessons/${created.id}`)).body;
    expect(lesson).toMatchObject({
      title: 'Field of a flat coil, revised',
      publishedVersion: 2,
      unpublishedChanges: true,
      checkpointCount: 0,
    });

    // Every publish is in the school's audit log.
    const audit = await t
      .db('audit_events')
      .where({ school_id: school.id, action: 'lesson_published' })
      .orderBy('id')
      .select('data', 'actor_id');
    expect(audit.map((row) => [row.actor_id, row.data.lessonId, row.data.version])).toEqual([
      [teacher.id, created.id, 1],
      [teacher.id, created.id, 2],
    ]);
  });

  it('saving the same content as the published version shows no unpublished changes', async () => {
    const teacher = await member(t, ['teacher']);
    const recording = await readyRecording(t, teacher);
    const lesson = await createLesson(teacher.client, recording.id);
    const content: LessonContent = { ...lesson.draft, checkpoints: [goodNote(1_000)] };
    await saveDraft(teacher.client, lesson.id, 0, content);
    expect((await teacher.client.send('post', `/api/lessons/${lesson.id}/publish`, { revision: 1, note: '' })).status).toBe(201);
    const changed = await saveDraft(teacher.client, lesson.id, 1, { ...content, checkpoints: [] });
    expect(changed.unpublishedChanges).toBe(true);
    // Back to what version 1 froze, sent with every object’s keys in another order: the same content, the same hash.
    const reordered = JSON.parse(JSON.stringify(content), (_key, value) =>
      value && typeof value === 'object' && !Array.isArray(value) ? Object.fromEntries(Object.entries(value).reverse()) : value,
    );
    const restored = await saveDraft(teacher.client, lesson.id, 2, reordered);
    expect(restored.unpublishedChanges).toBe(false);
    expect((await teacher.client.get('/api/lessons')).body.lessons[0].unpublishedChanges).toBe(false);
  });
});
