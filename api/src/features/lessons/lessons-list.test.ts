import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { buildDepartment, buildSchool } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { createLesson, goodNote, member, readyRecording, saveDraft } from './lessons.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const titles = (body: { lessons: { title: string }[] }) => body.lessons.map((l) => l.title);

describe('GET /api/lessons filters and sorts', () => {
  it('searches title and tags, filters by tag, owner and state, sorts, and offers the tags and owners it can see', async () => {
    const school = await buildSchool(t.db);
    const physics = await buildDepartment(t.db, school.id);
    const me = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
    const colleague = await member(t, ['teacher'], { schoolId: school.id, departmentId: physics.id });
    const recording = await readyRecording(t, me);
    const day = (n: number) => new Date(Date.UTC(2026, 0, n));

    const pendulum = await createLesson(me.client, recording.id, { title: 'Pendulum timing', tags: ['mechanics'] });
    const coil = await createLesson(me.client, recording.id, { title: 'coil at 100% current', tags: ['magnetism', 'coils'] });
    const helmholtz = await createLesson(colleague.client, recording.id, { title: 'Helmholtz pair', tags: ['magnetism'] });
    const hidden = await createLesson(colleague.client, recording.id, { title: 'Unshared magnet draft', tags: ['secret-tag'] });
    await colleague.client.send('patch', `/api/lessons/${helmholtz.id}`, { shared: true });
    // Published, archived and draft states; creation and update dates fixed for the sorts.
    await saveDraft(me.client, coil.id, 0, { ...coil.draft, checkpoints: [goodNote(1_000)] });
    expect((await me.client.send('post', `/api/lessons/${coil.id}/publish`, { revision: 1, note: '' })).status).toBe(201);
    await me.client.send('patch', `/api/lessons/${pendulum.id}`, { archived: true });
    await t
      .db('lessons')
      .where({ id: pendulum.id })
      .update({ created_at: day(1), updated_at: day(9) });
    await t
      .db('lessons')
      .where({ id: coil.id })
      .update({ created_at: day(2), updated_at: day(3) });
    await t
      .db('lessons')
      .where({ id: helmholtz.id })
      .update({ created_at: day(3), updated_at: day(5) });
    await t
      .db('lessons')
      .where({ id: hidden.id })
      .update({ created_at: day(4), updated_at: day(10) });

    const all = (await me.client.get('/api/lessons')).body;
    expect(titles(all)).toEqual(['Pendulum timing', 'Helmholtz pair', 'coil at 100% current']);
    // The colleague's unshared lesson gives away neither its tag nor anything else.
    expect(all.tags).toEqual(['coils', 'magnetism', 'mechanics']);
    expect(all.owners.map((o: { id: string }) => o.id).sort()).toEqual([me.id, colleague.id].sort());
    expect(all.lessons.map((l: { state: string }) => l.state)).toEqual(['archived', 'draft', 'published']);

    const get = async (query: string) => titles((await me.client.get(`/api/lessons?${query}`)).body);
    expect(await get('q=HELM')).toEqual(['Helmholtz pair']);
    expect(await get('q=magnet')).toEqual(['Helmholtz pair', 'coil at 100% current']);
    expect(await get('q=100%25')).toEqual(['coil at 100% current']);
    expect(await get('q=_')).toEqual([]);
    expect(await get('tag=Coils')).toEqual(['coil at 100% current']);
    expect(await get('tag=secret-tag')).toEqual([]);
    expect(await get('owner=me')).toEqual(['Pendulum timing', 'coil at 100% current']);
    expect(await get('owner=others')).toEqual(['Helmholtz pair']);
    expect(await get(`owner=${colleague.id}`)).toEqual(['Helmholtz pair']);
    expect(await get('state=draft')).toEqual(['Helmholtz pair']);
    expect(await get('state=published')).toEqual(['coil at 100% current']);
    expect(await get('state=archived')).toEqual(['Pendulum timing']);
    expect(await get('sort=title')).toEqual(['coil at 100% current', 'Helmholtz pair', 'Pendulum timing']);
    expect(await get('sort=created')).toEqual(['Helmholtz pair', 'coil at 100% current', 'Pendulum timing']);
    expect(await get('state=published&owner=me&q=coil&tag=magnetism')).toEqual(['coil at 100% current']);

    const summary = (await me.client.get('/api/lessons?q=coil')).body.lessons[0];
    expect(summary).toMatchObject({ publishedVersion: 1, unpublishedChanges: false, checkpointCount: 1, shared: false });
    expect((await fetch(summary.posterUrl)).status).toBe(200);
  });
});
