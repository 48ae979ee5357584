import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RecordingDetailDtoSchema, RecordingListDtoSchema } from '@core/contracts';
import { createTestApp, type TestApp } from '../../../test/test-app';
import { buildSchool } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { createLesson, goodNote, member, readyRecording, saveDraft } from '../lessons/lessons.test-support';
import { inUseSentence } from './recordings.service';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

describe('recordings name the lessons built on them', () => {
  it('lists usedBy on the library and the detail, and refuses to delete a recording a lesson uses, naming it', async () => {
    const school = await buildSchool(t.db);
    const owner = await member(t, ['teacher'], { schoolId: school.id });
    const used = await readyRecording(t, owner, 'Two coils');
    const unused = await readyRecording(t, owner, 'Spare take');
    const lesson = await createLesson(owner.client, used.id, { title: 'Helmholtz pair' });

    const library = RecordingListDtoSchema.parse((await owner.client.get('/api/recordings')).body);
    const byTitle = Object.fromEntries(library.recordings.map((r) => [r.title, r.usedBy]));
    expect(byTitle).toEqual({ 'Two coils': [{ id: lesson.id, title: 'Helmholtz pair', state: 'draft' }], 'Spare take': [] });

    const refused = await owner.client.send('delete', `/api/recordings/${used.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toEqual({
      code: 'recording_in_use',
      message:
        'The lesson “Helmholtz pair” uses this recording, so it cannot be deleted. Delete that lesson first; a lesson that was ever published keeps its recording: archive it to hide it instead.',
    });
    // Refused before storage was touched: the recording still plays.
    expect(await t.storage.listKeys(used.prefix)).toHaveLength(4);
    expect((await owner.client.get(`/api/recordings/${used.id}/playback`)).status).toBe(200);

    // Published, the lesson shows as such on the recording's detail.
    await saveDraft(owner.client, lesson.id, 0, { ...lesson.draft, checkpoints: [goodNote(1_000)] });
    expect((await owner.client.send('post', `/api/lessons/${lesson.id}/publish`, { revision: 1, note: '' })).status).toBe(201);
    const detail = RecordingDetailDtoSchema.parse((await owner.client.get(`/api/recordings/${used.id}`)).body);
    expect(detail.usedBy).toEqual([{ id: lesson.id, title: 'Helmholtz pair', state: 'published' }]);

    // A lesson never published can be deleted, and then so can its recording.
    const other = await createLesson(owner.client, unused.id, { title: 'Scratch' });
    expect((await owner.client.send('delete', `/api/recordings/${unused.id}`)).status).toBe(409);
    expect((await owner.client.send('delete', `/api/lessons/${other.id}`)).status).toBe(204);
    expect((await owner.client.send('delete', `/api/recordings/${unused.id}`)).status).toBe(204);
    expect(await t.storage.listKeys(unused.prefix)).toEqual([]);
  });

  it('names several lessons with their count, and at most three by name', () => {
    const use = (title: string) => ({ id: title, title, state: 'draft' as const });
    expect(inUseSentence([use('A'), use('B')])).toBe(
      '2 lessons use this recording (“A” and “B”), so it cannot be deleted. Delete those lessons first; a lesson that was ever published keeps its recording: archive it to hide it instead.',
    );
    expect(inUseSentence([use('A'), use('B'), use('C')])).toMatch(/^3 lessons use this recording \(“A”, “B” and “C”\)/);
    expect(inUseSentence([use('A'), use('B'), use('C'), use('D'), use('E')])).toMatch(
      /^5 lessons use this recording \(“A”, “B”, “C” and 2 more\)/,
    );
  });
});
