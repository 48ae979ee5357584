import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import webvtt from 'webvtt-parser';
import { chaptersVtt, checkpointsVtt } from '@core/lessons/lesson-vtt';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { goodNote, member, saveDraft } from './lessons.test-support';
import { everyKindContent, KEYS, SECRETS, teacherWithLesson } from './lesson-transfer.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

/** A conforming parser (webvtt-parser follows the W3C WebVTT parsing rules) must read it without one error. */
function parseTrack(text: string, mode: 'chapters' | 'metadata') {
  const result = new webvtt.WebVTTParser().parse(text, mode);
  expect(result.errors).toEqual([]);
  return result.cues;
}

describe('the WebVTT tracks of a lesson, as a conforming parser reads them', () => {
  it('chapters: one cue per chapter with its title; a tricky title still parses', () => {
    const content = everyKindContent();
    content.chapters.push({ key: 'chapterccc', title: '<b>Bold</b> & --> arrows', startMs: 12_000, endMs: 15_000 });
    const cues = parseTrack(chaptersVtt(content), 'chapters');
    expect(cues.map((cue) => [cue.id, cue.startTime, cue.endTime])).toEqual([
      ['chapteraaa', 0, 4],
      ['chapterbbb', 4, 12],
      ['chapterccc', 12, 15],
    ]);
    expect(cues[2]!.text).toBe('&lt;b&gt;Bold&lt;/b&gt; &amp; --&gt; arrows');
  });

  it('checkpoints: one metadata cue per checkpoint, its payload JSON with key, kind and label only', () => {
    const content = everyKindContent();
    content.checkpoints[0]!.label = 'Needle --> which way? <now>';
    const cues = parseTrack(checkpointsVtt(content), 'metadata');
    expect(cues.map((cue) => cue.id)).toEqual(Object.values(KEYS));
    expect(cues.map((cue) => [cue.startTime, cue.endTime])).toEqual([
      [1, 2],
      [2, 3],
      [3, 4],
      [4, 5],
      [5, 6],
      [6, 7],
      [7, 7.001],
    ]);
    const payloads = cues.map((cue) => JSON.parse(cue.text) as Record<string, unknown>);
    expect(payloads[0]).toEqual({ key: KEYS.choice, kind: 'multiple-choice', label: 'Needle --> which way? <now>' });
    for (const payload of payloads) expect(Object.keys(payload)).toEqual(['key', 'kind', 'label']);
  });
});

describe('GET /api/lessons/:lessonId/chapters.vtt and /checkpoints.vtt', () => {
  it('401 signed out, 403 for a student, 404 for another school', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    expect((await new Client(t).get(`/api/lessons/${lesson.id}/chapters.vtt`)).status).toBe(401);
    const student = await member(t, ['student'], { schoolId: teacher.schoolId });
    expect((await student.client.get(`/api/lessons/${lesson.id}/checkpoints.vtt`)).status).toBe(403);
    const stranger = await member(t, ['admin']);
    expect((await stranger.client.get(`/api/lessons/${lesson.id}/checkpoints.vtt`)).status).toBe(404);
  });

  it('serves the draft to its owner as text/vtt with nosniff, never holding an answer key', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const chapters = await teacher.client.get(`/api/lessons/${lesson.id}/chapters.vtt`);
    expect(chapters.status).toBe(200);
    expect(chapters.headers['content-type']).toBe('text/vtt; charset=utf-8');
    expect(chapters.headers['x-content-type-options']).toBe('nosniff');
    expect(parseTrack(chapters.text, 'chapters').map((cue) => cue.text)).toEqual(['Set-up', 'Measure &amp; compare']);

    const checkpoints = await teacher.client.get(`/api/lessons/${lesson.id}/checkpoints.vtt`);
    expect(checkpoints.headers['content-type']).toBe('text/vtt; charset=utf-8');
    expect(parseTrack(checkpoints.text, 'metadata')).toHaveLength(7);
    for (const secret of Object.values(SECRETS)) expect(checkpoints.text).not.toContain(secret);
  });

  it('others get the newest published version; ?version=N picks one', async () => {
    const first = { ...everyKindContent(), checkpoints: [goodNote(1000, 'Only one.')] };
    const { teacher, lesson, revision } = await teacherWithLesson(t, first);
    expect((await teacher.client.send('post', `/api/lessons/${lesson.id}/publish`, { revision, note: '' })).status).toBe(201);
    await saveDraft(teacher.client, lesson.id, revision, { ...first, checkpoints: [goodNote(1000, 'One.'), goodNote(3000, 'Two.')] });
    await teacher.client.send('patch', `/api/lessons/${lesson.id}`, { shared: true });
    const substitute = await member(t, ['substitute'], { schoolId: teacher.schoolId });
    const count = async (client: Client, query = '') =>
      parseTrack((await client.get(`/api/lessons/${lesson.id}/checkpoints.vtt${query}`)).text, 'metadata').length;
    expect(await count(substitute.client)).toBe(1);
    expect(await count(teacher.client)).toBe(2);
    expect(await count(teacher.client, '?version=1')).toBe(1);
    expect((await teacher.client.get(`/api/lessons/${lesson.id}/chapters.vtt?version=0`)).status).toBe(400);
  });
});
