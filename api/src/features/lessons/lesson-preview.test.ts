import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CheckpointGradeDtoSchema, StudentLessonViewSchema } from '@core/contracts';
import { toStudentView } from '@core/lessons';
import { Client, createTestApp, type TestApp } from '../../../test/test-app';
import { buildDepartment } from '../../../test/factories';
import { deleteSchoolObjects } from '../uploads/uploads.test-support';
import { member } from './lessons.test-support';
import { everyKindContent, KEYS, SECRETS, teacherWithLesson } from './lesson-transfer.test-support';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await deleteSchoolObjects(t);
  await t.close();
});

const answerPath = (lessonId: string, key: string) => `/api/lessons/${lessonId}/preview/checkpoints/${key}/answer`;

describe('GET /api/lessons/:lessonId/preview', () => {
  it('401 signed out, 403 for a student, 404 for another school', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    expect((await new Client(t).get(`/api/lessons/${lesson.id}/preview`)).status).toBe(401);
    const student = await member(t, ['student'], { schoolId: teacher.schoolId });
    expect((await student.client.get(`/api/lessons/${lesson.id}/preview`)).status).toBe(403);
    const stranger = await member(t, ['teacher', 'admin']);
    const res = await stranger.client.get(`/api/lessons/${lesson.id}/preview`);
    expect(res.status).toBe(404);
    expect(res.body.error).toEqual({ code: 'not_found', message: 'That lesson was not found.' });
  });

  it('is the draft as the student player receives it, with no answer key anywhere in it', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const res = await teacher.client.get(`/api/lessons/${lesson.id}/preview`);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('private, no-store');
    const view = StudentLessonViewSchema.parse(res.body);
    expect(view.checkpoints.map((c) => c.key)).toEqual(Object.values(KEYS));
    // The same engine, seeded per previewing person, in the school's locale.
    expect(res.body).toEqual(toStudentView(everyKindContent(), { seed: `preview:${teacher.id}`, locale: 'en-GB' }));
    const serialised = JSON.stringify(res.body);
    for (const secret of Object.values(SECRETS)) expect(serialised).not.toContain(secret);
    for (const field of [
      '"correct',
      '"answer"',
      '"expected"',
      '"hints"',
      '"explanation"',
      '"feedback"',
      '"accepted"',
      '"distractors"',
      '"revealText"',
    ]) {
      expect(serialised).not.toContain(field);
    }
  });

  it('a shared lesson is previewed by a substitute; an unshared one is not found for them', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const substitute = await member(t, ['substitute'], { schoolId: teacher.schoolId });
    expect((await substitute.client.get(`/api/lessons/${lesson.id}/preview`)).status).toBe(404);
    expect((await teacher.client.send('patch', `/api/lessons/${lesson.id}`, { shared: true })).status).toBe(200);
    expect((await substitute.client.get(`/api/lessons/${lesson.id}/preview`)).status).toBe(200);
  });
});

describe('POST /api/lessons/:lessonId/preview/checkpoints/:key/answer', () => {
  it('400 for a malformed body, with the field', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const res = await teacher.client.send('post', answerPath(lesson.id, KEYS.choice), {
      attempt: 0,
      answer: { kind: 'multiple-choice', optionIds: [] },
    });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'validation_failed', details: [{ path: 'attempt' }] });
  });

  it('grades right and wrong choices, unlocks hints after a miss and reveals only on the last attempt', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const pick = (optionIds: string[], attempt: number) =>
      teacher.client.send('post', answerPath(lesson.id, KEYS.choice), { attempt, answer: { kind: 'multiple-choice', optionIds } });

    const wrong = await pick(['wrong'], 1);
    expect(wrong.status).toBe(200);
    expect(CheckpointGradeDtoSchema.parse(wrong.body)).toMatchObject({
      correct: false,
      score: 0,
      attemptsLeft: 1,
      hints: [`${SECRETS.hint} 1`],
      reveal: null,
    });
    expect(wrong.body.feedback).toContain(`${SECRETS.feedback} wrong`);

    const last = await pick(['wrong'], 2);
    expect(last.body).toMatchObject({ correct: false, attemptsLeft: 0, reveal: { explanation: SECRETS.explanation } });
    expect(last.body.reveal.answer).toContain('Clockwise');

    const right = await pick(['right'], 1);
    expect(right.body).toMatchObject({ correct: true, score: 1, hints: [], reveal: { explanation: SECRETS.explanation } });
  });

  it('an unreadable numeric answer is invalid and uses up no attempt', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const send = (text: string, attempt: number) =>
      teacher.client.send('post', answerPath(lesson.id, KEYS.numeric), { attempt, answer: { kind: 'numeric', text } });
    const invalid = await send('62.8 furlongs', 1);
    expect(invalid.body).toMatchObject({ invalid: true, attemptsLeft: 3, hints: [], reveal: null });
    expect(invalid.body.feedback).toContain('"furlongs" is not a unit');
    expect((await send('62.8 uT', 1)).body).toMatchObject({ correct: true, invalid: false });
  });

  it('404 for a key not in the draft; 400 answer_mismatch for an answer of another kind, an unknown option or a note', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const missing = await teacher.client.send('post', answerPath(lesson.id, 'nosuchkey'), {
      attempt: 1,
      answer: { kind: 'short-text', text: 'x' },
    });
    expect(missing.status).toBe(404);
    expect(missing.body.error.message).toBe('That checkpoint (it may have been removed from the draft) was not found.');

    const otherKind = await teacher.client.send('post', answerPath(lesson.id, KEYS.choice), {
      attempt: 1,
      answer: { kind: 'numeric', text: '1' },
    });
    expect(otherKind.status).toBe(400);
    expect(otherKind.body.error).toEqual({
      code: 'answer_mismatch',
      message: 'This checkpoint is a multiple choice question; the answer sent is for numeric answer.',
    });
    const unknownOption = await teacher.client.send('post', answerPath(lesson.id, KEYS.choice), {
      attempt: 1,
      answer: { kind: 'multiple-choice', optionIds: ['nosuch'] },
    });
    expect(unknownOption.status).toBe(400);
    expect(unknownOption.body.error.code).toBe('answer_mismatch');
    const note = await teacher.client.send('post', answerPath(lesson.id, KEYS.note), {
      attempt: 1,
      answer: { kind: 'short-text', text: 'ok' },
    });
    expect(note.status).toBe(400);
    expect(note.body.error.code).toBe('answer_mismatch');
  });

  it('stores nothing: the lesson row is unchanged after answering', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const before = await t.db('lessons').where({ id: lesson.id }).first();
    const res = await teacher.client.send('post', answerPath(lesson.id, KEYS.short), {
      attempt: 1,
      answer: { kind: 'short-text', text: SECRETS.accepted },
    });
    expect(res.body).toMatchObject({ correct: true });
    expect(await t.db('lessons').where({ id: lesson.id }).first()).toEqual(before);
  });

  it('a coordinator of the department previews and answers a colleague’s unshared lesson', async () => {
    const { teacher, lesson } = await teacherWithLesson(t);
    const department = await buildDepartment(t.db, teacher.schoolId);
    await t.db('lessons').where({ id: lesson.id }).update({ department_id: department.id });
    const coordinator = await member(t, ['coordinator'], { schoolId: teacher.schoolId, departmentId: department.id });
    const res = await coordinator.client.send('post', answerPath(lesson.id, KEYS.sign), {
      attempt: 1,
      answer: { kind: 'sign', choice: '+z' },
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ correct: true });
  });
});
