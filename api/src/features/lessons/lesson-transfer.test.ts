import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse as parseDisposition } from 'content-disposition';
import { LessonDtoSchema } from '@core/contracts';
import { lessonFileText, toLessonFile } from '@core/lessons/lesson-file';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { insertRecording } from '../recordings/test-recordings';
import { goodNote, member, readyRecording, saveDraft } from './lessons.test-support';
import { everyKindContent, teacherWithLesson } from './lesson-transfer.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

/** supertest keeps a JSON download as text: read the body as the file's bytes. */
const asText = (res: { text: string }) => res.text;

describe('GET /api/lessons/:lessonId/export', () => {
  it('401 signed out, 403 for a student, 404 for another school, 400 for a bad version', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    expect((await new Client(t).get(`/api/lessons/${lesson.id}/export`)).status).toBe(401);
    const student = await member(t, ['student'], { schoolId: teacher.schoolId });
    expect((await student.client.get(`/api/lessons/${lesson.id}/export`)).status).toBe(403);
    const stranger = await member(t, ['teacher']);
    expect((await stranger.client.get(`/api/lessons/${lesson.id}/export`)).status).toBe(404);
    const bad = await teacher.client.get(`/api/lessons/${lesson.id}/export?version=zero`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.details).toEqual([{ path: 'version', message: 'The version is a number, like ?version=2.' }]);
    const missing = await teacher.client.get(`/api/lessons/${lesson.id}/export?version=3`);
    expect(missing.status).toBe(404);
    expect(missing.body.error.message).toBe('Version 3 of “Every kind (test)” was not found.');
  });

  it('downloads the draft as a Pinfield lesson file named after the title (RFC 5987 for non-ASCII)', async () => {
    const content = everyKindContent();
    content.settings.title = 'Spule & Kompass — Feld';
    const { teacher, lesson } = await teacherWithLesson(t, content);
    const res = await teacher.client.get(`/api/lessons/${lesson.id}/export`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    // RFC 6266: a Latin-1 fallback name and the exact name as an RFC 5987 UTF-8 value.
    expect(res.headers['content-disposition']).toBe(
      `attachment; filename="Spule & Kompass ? Feld.pinfield-lesson.json"; filename*=UTF-8''Spule%20%26%20Kompass%20%E2%80%94%20Feld.pinfield-lesson.json`,
    );
    expect(parseDisposition(res.headers['content-disposition']!).parameters.filename).toBe('Spule & Kompass — Feld.pinfield-lesson.json');
    const file = JSON.parse(asText(res));
    expect(file).toMatchObject({
      format: 'pinfield.lesson',
      formatVersion: 1,
      recording: { title: 'Coil and compass (test)', durationMs: 12_000 },
    });
    expect(file.lesson).toEqual(content);
  });

  it('a colleague gets the newest published version by default; ?version=N picks one; the owner gets the draft', async () => {
    const first = { ...everyKindContent(), checkpoints: [goodNote(1000, 'Version one.')] };
    const { teacher, lesson, revision } = await teacherWithLesson(t, first);
    const published = await teacher.client.send('post', `/api/lessons/${lesson.id}/publish`, { revision, note: '' });
    expect(published.status).toBe(201);
    await saveDraft(teacher.client, lesson.id, revision, { ...first, checkpoints: [goodNote(2000, 'Draft after it.')] });
    await teacher.client.send('patch', `/api/lessons/${lesson.id}`, { shared: true });
    const substitute = await member(t, ['substitute'], { schoolId: teacher.schoolId });

    const bodyOf = (res: { text: string }) => JSON.parse(asText(res)).lesson.checkpoints[0].body as string;
    expect(bodyOf(await substitute.client.get(`/api/lessons/${lesson.id}/export`))).toBe('Version one.');
    expect(bodyOf(await teacher.client.get(`/api/lessons/${lesson.id}/export`))).toBe('Draft after it.');
    expect(bodyOf(await teacher.client.get(`/api/lessons/${lesson.id}/export?version=1`))).toBe('Version one.');
  });
});

describe('POST /api/lessons/import', () => {
  it('an exported file imports as a new draft with equal content and the same keys', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const exported = asText(await teacher.client.get(`/api/lessons/${lesson.id}/export`));
    const other = await readyRecording(t, teacher, 'Second take (test)');
    const res = await teacher.client.send('post', '/api/lessons/import', {
      recordingId: other.id,
      fileName: 'every.pinfield-lesson.json',
      text: exported,
    });
    expect(res.status).toBe(201);
    const imported = LessonDtoSchema.parse(res.body);
    expect(imported.id).not.toBe(lesson.id);
    expect(imported).toMatchObject({
      state: 'draft',
      revision: 0,
      shared: false,
      owner: { id: teacher.id },
      recording: { id: other.id, title: 'Second take (test)' },
    });
    expect(imported.draft).toEqual(everyKindContent());
  });

  it('400 lesson_file_invalid names the line of a syntax error, and nothing is saved', async () => {
    const teacher = await member(t, ['teacher']);
    const recording = await readyRecording(t, teacher);
    const lines = lessonFileText(toLessonFile(everyKindContent(), { title: 'x', durationMs: 1000 })).split('\n');
    const broken = lines.findIndex((line) => line.includes('"level"'));
    lines[broken] = lines[broken]!.replace(/,$/, '');
    const res = await teacher.client.send('post', '/api/lessons/import', {
      recordingId: recording.id,
      fileName: 'coil.json',
      text: lines.join('\n'),
    });
    expect(res.status).toBe(400);
    expect(res.body.error).toEqual({
      code: 'lesson_file_invalid',
      message: `“coil.json” has a problem on line ${broken + 2}: A comma was expected here, between two fields or two items. Nothing was imported.`,
      details: [{ path: `line ${broken + 2}`, message: 'A comma was expected here, between two fields or two items.' }],
    });
    expect(await t.db('lessons').where({ school_id: teacher.schoolId }).count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('400 names the line of a wrong type, an unknown kind and a missing format', async () => {
    const teacher = await member(t, ['teacher']);
    const recording = await readyRecording(t, teacher);
    // The file as a person edits it: plain JSON, any value anywhere.
    const file = JSON.parse(lessonFileText(toLessonFile(everyKindContent(), { title: 'x', durationMs: 1000 }))) as {
      format?: string;
      lesson: { checkpoints: Record<string, unknown>[] };
    };
    file.lesson.checkpoints[1]!.points = 'ten';
    file.lesson.checkpoints[4]!.kind = 'poll';
    const text = JSON.stringify(file, null, 2);
    const lineOf = (fragment: string) => text.slice(0, text.indexOf(fragment)).split('\n').length;
    const res = await teacher.client.send('post', '/api/lessons/import', { recordingId: recording.id, fileName: 'hand-edited.json', text });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('lesson_file_invalid');
    expect(res.body.error.message).toBe(
      `“hand-edited.json” has 2 problems, the first on line ${lineOf('"points": "ten"')}. Nothing was imported: fix them and choose the file again.`,
    );
    expect(res.body.error.details).toEqual([
      { path: `line ${lineOf('"points": "ten"')}`, message: 'lesson.checkpoints.1.points: Expected points as a number.' },
      {
        path: `line ${lineOf('"kind": "poll"')}`,
        message:
          'lesson.checkpoints.4.kind: Unknown checkpoint kind "poll": use one of multiple-choice, numeric, short-text, equation, sign, prediction, note.',
      },
    ]);

    delete file.format;
    const noFormat = await teacher.client.send('post', '/api/lessons/import', {
      recordingId: recording.id,
      fileName: 'x.json',
      text: JSON.stringify(file),
    });
    expect(noFormat.body.error.details).toEqual([
      { path: 'line 1', message: 'format: This is not a Pinfield lesson file: "format": "pinfield.lesson" is missing.' },
    ]);
  });

  it('403 for a role without a library, 404 for another school’s recording, 400 for one not ready', async () => {
    const teacher = await member(t, ['teacher']);
    const text = lessonFileText(toLessonFile(everyKindContent(), { title: 'x', durationMs: 1000 }));
    const recording = await readyRecording(t, teacher);
    const substitute = await member(t, ['substitute'], { schoolId: teacher.schoolId });
    expect(
      (await substitute.client.send('post', '/api/lessons/import', { recordingId: recording.id, fileName: 'a.json', text })).status,
    ).toBe(403);
    const stranger = await member(t, ['teacher']);
    const foreign = await stranger.client.send('post', '/api/lessons/import', { recordingId: recording.id, fileName: 'a.json', text });
    expect(foreign.status).toBe(404);
    const processing = await insertRecording(t.db, {
      schoolId: teacher.schoolId,
      ownerId: teacher.id,
      state: 'processing',
      title: 'Still going',
    });
    const notReady = await teacher.client.send('post', '/api/lessons/import', { recordingId: processing.id, fileName: 'a.json', text });
    expect(notReady.status).toBe(400);
    expect(notReady.body.error.code).toBe('recording_not_ready');
  });

  it('checkpoints past the end of the recording import as a draft whose problems say so', async () => {
    const teacher = await member(t, ['teacher']);
    const recording = await readyRecording(t, teacher);
    const late = { ...everyKindContent(), checkpoints: [goodNote(60_000, 'After the end.')] };
    const text = lessonFileText(toLessonFile(late, { title: 'A longer take', durationMs: 90_000 }));
    const res = await teacher.client.send('post', '/api/lessons/import', { recordingId: recording.id, fileName: 'long.json', text });
    expect(res.status).toBe(201);
    expect(res.body.problems.map((p: { path: string }) => p.path)).toContain('checkpoints.0.atMs');
  });
});
